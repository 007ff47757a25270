import {
  ArrowDownIcon,
  ArrowUpIcon,
  CaretSortIcon,
  ChevronLeftIcon,
  ChevronRightIcon,
} from '@radix-ui/react-icons';
import { Badge, Button, Flex, Select, Table, Text, VisuallyHidden } from '@radix-ui/themes';
import {
  claimantKindLabels,
  claimSortFields,
  type ClaimListItem,
  type ClaimQueueQuery,
  type ClaimSortField,
} from '@skyledger/contracts';
import {
  createColumnHelper,
  functionalUpdate,
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type Header,
  type PaginationState,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import { AppLink } from '@/components/ui/app-link';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format-date';
import { firstOrder, queueDefaults } from '../api/queue-search';
import { ClaimStatusBadge } from './claim-status-badge';

const features = tableFeatures({ rowSortingFeature, rowPaginationFeature });
type Features = typeof features;
const column = createColumnHelper<Features, ClaimListItem>();

const columns = column.columns([
  column.accessor('summary', {
    header: 'Claim',
    sortDescFirst: firstOrder.summary === 'desc',
    cell: ({ row }) => (
      <Flex direction="column" gap="1" align="start">
        <AppLink to={paths.app.claim.getHref(row.original.id)} weight="bold">
          {row.original.summary}
        </AppLink>
        {row.original.legalReview ? (
          <Badge color="red" variant="soft" highContrast>
            Legal review
          </Badge>
        ) : null}
      </Flex>
    ),
  }),
  column.accessor('status', {
    header: 'Status',
    sortDescFirst: firstOrder.status === 'desc',
    cell: ({ getValue }) => <ClaimStatusBadge status={getValue()} />,
  }),
  column.display({
    id: 'claimant',
    header: 'Claimant',
    cell: ({ row }) => (
      <Flex direction="column">
        <Text>{row.original.claimant.name}</Text>
        <Text size="1" color="gray">
          {claimantKindLabels[row.original.claimant.kind]}
        </Text>
      </Flex>
    ),
  }),
  column.display({
    id: 'topics',
    header: 'Topics',
    cell: ({ row }) =>
      row.original.topics.length ? (
        <Flex gap="1" wrap="wrap">
          {row.original.topics.map((topic) => (
            <Badge key={topic} color="gray" variant="outline" highContrast>
              {topic}
            </Badge>
          ))}
        </Flex>
      ) : (
        <Text color="gray">None</Text>
      ),
  }),
  column.display({
    id: 'assignee',
    header: 'Researched by',
    cell: ({ row }) =>
      row.original.assignee ? (
        <Text>{row.original.assignee.displayName}</Text>
      ) : (
        <Text color="gray">Nobody yet</Text>
      ),
  }),
  column.accessor('filedAt', {
    header: 'Filed',
    sortDescFirst: firstOrder.filedAt === 'desc',
    cell: ({ row }) => (
      <Flex direction="column">
        <time dateTime={row.original.filedAt}>{formatDate(row.original.filedAt)}</time>
        <Text size="1" color="gray">
          by {row.original.filedBy.displayName}
        </Text>
      </Flex>
    ),
  }),
  column.accessor('updatedAt', {
    header: 'Last change',
    sortDescFirst: firstOrder.updatedAt === 'desc',
    cell: ({ getValue }) => <time dateTime={getValue()}>{formatDate(getValue())}</time>,
  }),
]);

const sortable = new Set<string>(claimSortFields);
const emptyRows: ClaimListItem[] = [];

interface QueueTableProps {
  items: readonly ClaimListItem[];
  total: number;
  query: ClaimQueueQuery;
  /** Moves the view to a new sort or page; the table itself keeps no state of its own. */
  onChange: (changes: Partial<ClaimQueueQuery>) => void;
}

function SortButton({ header }: { header: Header<Features, ClaimListItem, unknown> }) {
  const sorted = header.column.getIsSorted();
  const Icon = !sorted ? CaretSortIcon : sorted === 'asc' ? ArrowUpIcon : ArrowDownIcon;
  const label = String(header.column.columnDef.header);
  return (
    <Button
      type="button"
      variant="ghost"
      color="gray"
      highContrast
      className="sl-sort-button"
      onClick={header.column.getToggleSortingHandler()}
    >
      {label}
      <Icon aria-hidden />
    </Button>
  );
}

/** The queue's rows, sorted and paged by the API; sorting here only changes the URL. */
export function QueueTable({ items, total, query, onChange }: QueueTableProps) {
  const sorting: SortingState = [
    {
      id: query.sort ?? queueDefaults.sort,
      desc: (query.order ?? queueDefaults.order) === 'desc',
    },
  ];
  const pagination: PaginationState = {
    pageIndex: (query.page ?? 1) - 1,
    pageSize: query.pageSize ?? queueDefaults.pageSize,
  };
  const table = useTable({
    features,
    columns,
    data: items.length ? (items as ClaimListItem[]) : emptyRows,
    getRowId: (row) => row.id,
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    rowCount: total,
    state: { sorting, pagination },
    onSortingChange: (updater: Updater<SortingState>) => {
      const [next] = functionalUpdate(updater, sorting);
      if (next && sortable.has(next.id)) {
        onChange({ sort: next.id as ClaimSortField, order: next.desc ? 'desc' : 'asc' });
      }
    },
    onPaginationChange: (updater: Updater<PaginationState>) => {
      const next = functionalUpdate(updater, pagination);
      onChange({ page: next.pageIndex + 1, pageSize: next.pageSize });
    },
  });

  const sortedBy = sorting[0];
  const first = total === 0 ? 0 : pagination.pageIndex * pagination.pageSize + 1;
  const last = Math.min(total, (pagination.pageIndex + 1) * pagination.pageSize);
  return (
    <Flex direction="column" gap="3">
      <Table.Root variant="surface" className="sl-queue-table">
        <VisuallyHidden asChild>
          <caption>
            Claims in the queue, sorted by{' '}
            {String(table.getColumn(sortedBy?.id ?? 'filedAt')?.columnDef.header ?? 'Filed')},{' '}
            {sortedBy?.desc ? 'descending' : 'ascending'}
          </caption>
        </VisuallyHidden>
        <Table.Header>
          {table.getHeaderGroups().map((group) => (
            <Table.Row key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <Table.ColumnHeaderCell
                    key={header.id}
                    aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}
                  >
                    {sortable.has(header.column.id) ? (
                      <SortButton header={header} />
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </Table.ColumnHeaderCell>
                );
              })}
            </Table.Row>
          ))}
        </Table.Header>
        <Table.Body>
          {table.getRowModel().rows.map((row) => (
            <Table.Row key={row.id}>
              {row.getAllCells().map((cell) =>
                cell.column.id === 'summary' ? (
                  <Table.RowHeaderCell key={cell.id} className="sl-queue-summary">
                    <table.FlexRender cell={cell} />
                  </Table.RowHeaderCell>
                ) : (
                  <Table.Cell key={cell.id}>
                    <table.FlexRender cell={cell} />
                  </Table.Cell>
                ),
              )}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
      <Flex asChild justify="between" align="center" gap="3" wrap="wrap">
        <nav aria-label="Pages of the queue">
          <Text size="2" aria-live="polite">
            {total === 0
              ? 'No claims'
              : `Claims ${first}–${last} of ${total}, page ${pagination.pageIndex + 1} of ${table.getPageCount()}`}
          </Text>
          <Flex gap="3" align="center" wrap="wrap">
            <PageSizeSelect
              value={pagination.pageSize}
              onChange={(pageSize) => onChange({ pageSize, page: 1 })}
            />
            <Button
              variant="soft"
              color="gray"
              highContrast
              disabled={!table.getCanPreviousPage()}
              onClick={() => table.previousPage()}
            >
              <ChevronLeftIcon aria-hidden />
              Previous page
            </Button>
            <Button
              variant="soft"
              color="gray"
              highContrast
              disabled={!table.getCanNextPage()}
              onClick={() => table.nextPage()}
            >
              Next page
              <ChevronRightIcon aria-hidden />
            </Button>
          </Flex>
        </nav>
      </Flex>
    </Flex>
  );
}

const pageSizes = [10, 25, 50, 100] as const;

function PageSizeSelect({ value, onChange }: { value: number; onChange: (size: number) => void }) {
  const sizes = pageSizes.some((size) => size === value) ? pageSizes : [...pageSizes, value];
  return (
    <Flex gap="2" align="center">
      <Text size="2" id="queue-page-size">
        Per page
      </Text>
      <Select.Root value={String(value)} onValueChange={(next) => onChange(Number(next))}>
        <Select.Trigger aria-labelledby="queue-page-size" variant="soft" color="gray" />
        <Select.Content position="popper">
          {sizes.map((size) => (
            <Select.Item key={size} value={String(size)}>
              {size}
            </Select.Item>
          ))}
        </Select.Content>
      </Select.Root>
    </Flex>
  );
}
