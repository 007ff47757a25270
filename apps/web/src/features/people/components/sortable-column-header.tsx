import { ArrowDownIcon, ArrowUpIcon, CaretSortIcon } from '@radix-ui/react-icons';
import { Button, Table } from '@radix-ui/themes';
import type { UserSortField } from '@skyledger/contracts';
import type { UsersSort } from '../api/get-users';

interface SortableColumnHeaderProps {
  field: UserSortField;
  label: string;
  current: UsersSort;
  onSort: (field: UserSortField) => void;
}

export function SortableColumnHeader({ field, label, current, onSort }: SortableColumnHeaderProps) {
  const active = current.sort === field;
  const Icon = !active ? CaretSortIcon : current.order === 'asc' ? ArrowUpIcon : ArrowDownIcon;
  return (
    <Table.ColumnHeaderCell
      aria-sort={active ? (current.order === 'asc' ? 'ascending' : 'descending') : undefined}
    >
      <Button
        type="button"
        variant="ghost"
        color="gray"
        highContrast
        className="sl-sort-button"
        onClick={() => onSort(field)}
      >
        {label}
        <Icon aria-hidden />
      </Button>
    </Table.ColumnHeaderCell>
  );
}
