import { Card, DataList, Flex, Text } from '@radix-ui/themes';
import type { UserSortField } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { SortSelect, type SortChoice } from '@/components/ui/sort-select';
import type { UsersSort } from '../api/get-users';
import { LastSignIn } from './last-sign-in';
import type { PeopleTableProps } from './people-table';
import { UserActions } from './user-actions';
import { UserName } from './user-name';
import { UserRole } from './user-role';
import { UserStatusBadge } from './user-status-badge';

// Roles and statuses sort in the order the API keeps them (contracts' `roles`, `userStatuses`).
const sortChoices: SortChoice<UserSortField>[] = [
  { field: 'displayName', order: 'asc', label: 'Name, A to Z' },
  { field: 'displayName', order: 'desc', label: 'Name, Z to A' },
  { field: 'email', order: 'asc', label: 'E-mail, A to Z' },
  { field: 'email', order: 'desc', label: 'E-mail, Z to A' },
  { field: 'role', order: 'asc', label: 'Role, from reporter to desk chief' },
  { field: 'role', order: 'desc', label: 'Role, from desk chief to reporter' },
  { field: 'status', order: 'asc', label: 'Status, from invited to disabled' },
  { field: 'status', order: 'desc', label: 'Status, from disabled to invited' },
  { field: 'createdAt', order: 'desc', label: 'Added, newest first' },
  { field: 'createdAt', order: 'asc', label: 'Added, oldest first' },
  { field: 'lastSignInAt', order: 'desc', label: 'Last sign-in, latest first' },
  { field: 'lastSignInAt', order: 'asc', label: 'Last sign-in, earliest first' },
];

interface PeopleCardsProps extends Omit<PeopleTableProps, 'onSort'> {
  onSort: (sort: UsersSort) => void;
}

/** The people on a phone: each as a card with the table's facts and actions, and its sort as a choice. */
export function PeopleCards({ users, sort, onSort, currentUserId, onNotice }: PeopleCardsProps) {
  return (
    <Flex direction="column" gap="3">
      <SortSelect
        choices={sortChoices}
        sort={sort.sort}
        order={sort.order}
        onSort={(field, order) => onSort({ sort: field, order })}
      />
      <ul className="sl-card-list" aria-label="People on the desk">
        {users.map((user) => {
          const isCurrentUser = user.id === currentUserId;
          return (
            <li key={user.id}>
              <Card size="2">
                <Flex direction="column" gap="3">
                  <Flex justify="between" align="start" gap="2">
                    <UserName name={user.displayName} isCurrentUser={isCurrentUser}>
                      <Text size="2" color="gray" className="sl-break">
                        {user.email}
                      </Text>
                    </UserName>
                    <UserStatusBadge status={user.status} />
                  </Flex>
                  <DataList.Root size="2">
                    <DataList.Item align="center">
                      <DataList.Label minWidth="96px">Role</DataList.Label>
                      <DataList.Value>
                        <UserRole user={user} isCurrentUser={isCurrentUser} onNotice={onNotice} />
                      </DataList.Value>
                    </DataList.Item>
                    <DataList.Item>
                      <DataList.Label minWidth="96px">Added</DataList.Label>
                      <DataList.Value>
                        <DateTime value={user.createdAt} show="date" />
                      </DataList.Value>
                    </DataList.Item>
                    <DataList.Item>
                      <DataList.Label minWidth="96px">Last sign-in</DataList.Label>
                      <DataList.Value>
                        <LastSignIn at={user.lastSignInAt} />
                      </DataList.Value>
                    </DataList.Item>
                  </DataList.Root>
                  <UserActions user={user} isCurrentUser={isCurrentUser} onNotice={onNotice} />
                </Flex>
              </Card>
            </li>
          );
        })}
      </ul>
    </Flex>
  );
}
