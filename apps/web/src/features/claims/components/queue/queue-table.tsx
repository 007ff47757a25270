import { Badge, Flex, Table, Text, VisuallyHidden } from '@radix-ui/themes';
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
  type PaginationState,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import { AppLink } from '@/components/ui/app-link';
import { CardsOrTable } from '@/components/ui/cards-or-table';
import { DateTime } from '@/components/ui/date-time';
import { SortableColumnHeader } from '@/components/ui/sortable-column-header';
import { paths } from '@/config/paths';
import { firstOrder, queueDefaults } from '../../api/queue-search';
import { ClaimStatusBadge, LegalReviewBadge } from '../claim-status-badge';
import { QueueCards } from './queue-cards';
import { QueuePager } from './queue-pager';

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
        <LegalReviewBadge flagged={row.original.legalReview} />
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
        <DateTime value={row.original.filedAt} show="date" />
        <Text size="1" color="gray">
          by {row.original.filedBy.displayName}
        </Text>
      </Flex>
    ),
  }),
  column.accessor('updatedAt', {
    header: 'Last change',
    sortDescFirst: firstOrder.updatedAt === 'desc',
    cell: ({ getValue }) => <DateTime value={getValue()} show="date" />,
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
  return (
    <Flex direction="column" gap="3">
      {/* A phone gets the claims as cards, the same facts stacked, rather than a wide table. */}
      <CardsOrTable
        cards={<QueueCards items={items} query={query} onChange={onChange} />}
        table={
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
                  {group.headers.map((header) =>
                    sortable.has(header.column.id) ? (
                      <SortableColumnHeader
                        key={header.id}
                        label={String(header.column.columnDef.header)}
                        sorted={header.column.getIsSorted()}
                        onSort={() => header.column.toggleSorting()}
                      />
                    ) : (
                      <Table.ColumnHeaderCell key={header.id}>
                        <table.FlexRender header={header} />
                      </Table.ColumnHeaderCell>
                    ),
                  )}
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
        }
      />
      <QueuePager
        total={total}
        pagination={pagination}
        pageCount={table.getPageCount()}
        canPrevious={table.getCanPreviousPage()}
        canNext={table.getCanNextPage()}
        onPrevious={() => table.previousPage()}
        onNext={() => table.nextPage()}
        onPageSize={(pageSize) => onChange({ pageSize, page: 1 })}
      />
    </Flex>
  );
}
