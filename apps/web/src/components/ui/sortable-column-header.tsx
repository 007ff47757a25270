import { ArrowDownIcon, ArrowUpIcon, CaretSortIcon } from '@radix-ui/react-icons';
import { Button, Table } from '@radix-ui/themes';

interface SortableColumnHeaderProps {
  label: string;
  /** How the table is sorted by this column now, if at all. */
  sorted: 'asc' | 'desc' | false;
  onSort: () => void;
}

/** A column header whose button sorts by the column; `aria-sort` says how it is sorted. */
export function SortableColumnHeader({ label, sorted, onSort }: SortableColumnHeaderProps) {
  const Icon = !sorted ? CaretSortIcon : sorted === 'asc' ? ArrowUpIcon : ArrowDownIcon;
  return (
    <Table.ColumnHeaderCell
      aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}
    >
      <Button
        type="button"
        variant="ghost"
        color="gray"
        highContrast
        className="sl-sort-button"
        onClick={onSort}
      >
        {label}
        <Icon aria-hidden />
      </Button>
    </Table.ColumnHeaderCell>
  );
}
