import { Table, VisuallyHidden } from '@radix-ui/themes';
import type { UserListItem, UserSortField } from '@skyledger/contracts';
import { SortableColumnHeader } from '@/components/ui/sortable-column-header';
import type { UsersSort } from '../api/get-users';
import type { ShowNotice } from './people-notice';
import { UserRow } from './user-row';

const sortableColumns: readonly { field: UserSortField; label: string }[] = [
  { field: 'displayName', label: 'Name' },
  { field: 'email', label: 'E-mail' },
  { field: 'role', label: 'Role' },
  { field: 'status', label: 'Status' },
  { field: 'createdAt', label: 'Added' },
  { field: 'lastSignInAt', label: 'Last sign-in' },
];

export interface PeopleTableProps {
  users: readonly UserListItem[];
  sort: UsersSort;
  onSort: (field: UserSortField) => void;
  currentUserId: string;
  onNotice: ShowNotice;
}

export function PeopleTable({ users, sort, onSort, currentUserId, onNotice }: PeopleTableProps) {
  return (
    <Table.Root variant="surface">
      <VisuallyHidden asChild>
        <caption>People on the desk, sorted by the column marked as sorted</caption>
      </VisuallyHidden>
      <Table.Header>
        <Table.Row>
          {sortableColumns.map(({ field, label }) => (
            <SortableColumnHeader
              key={field}
              label={label}
              sorted={sort.sort === field ? sort.order : false}
              onSort={() => onSort(field)}
            />
          ))}
          <Table.ColumnHeaderCell>Actions</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {users.map((user) => (
          <UserRow
            key={user.id}
            user={user}
            isCurrentUser={user.id === currentUserId}
            onNotice={onNotice}
          />
        ))}
      </Table.Body>
    </Table.Root>
  );
}
