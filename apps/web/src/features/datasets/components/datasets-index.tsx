import { PlusIcon } from '@radix-ui/react-icons';
import {
  Box,
  Button,
  Card,
  Callout,
  Flex,
  Spinner,
  Table,
  Text,
  VisuallyHidden,
} from '@radix-ui/themes';
import type { DatasetSummary, Role } from '@skyledger/contracts';
import { Link as RouterLink } from 'react-router-dom';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/api-error-messages';
import { useDatasets } from '../api/get-datasets';
import { formatDecimalYear } from '../decimal-year';
import { ColumnBadges } from './column-badges';
import { mayImportDataset } from '../dataset-permissions';

function DatasetRow({ dataset }: { dataset: DatasetSummary }) {
  return (
    <Table.Row>
      <Table.RowHeaderCell>
        <AppLink to={paths.app.dataset.getHref(dataset.id)} weight="bold" className="sl-break">
          {dataset.name}
        </AppLink>
      </Table.RowHeaderCell>
      <Table.Cell>
        <Text size="2" className="sl-clamp-3">
          {dataset.description}
        </Text>
      </Table.Cell>
      <Table.Cell>
        <ColumnBadges columns={dataset.columns} />
      </Table.Cell>
      <Table.Cell className="sl-number">{dataset.rowCount}</Table.Cell>
      <Table.Cell className="sl-nowrap">
        {formatDecimalYear(dataset.timeRange.from)}–{formatDecimalYear(dataset.timeRange.to)}
      </Table.Cell>
      <Table.Cell>
        <Flex direction="column">
          <Text size="2">{dataset.createdBy.displayName}</Text>
          <Text size="1" color="gray">
            <DateTime value={dataset.createdAt} />
          </Text>
        </Flex>
      </Table.Cell>
    </Table.Row>
  );
}

/** The same facts as a row of the table, stacked for a phone. */
function DatasetCard({ dataset }: { dataset: DatasetSummary }) {
  return (
    <Card size="2">
      <Flex direction="column" gap="2">
        <AppLink to={paths.app.dataset.getHref(dataset.id)} weight="bold" className="sl-break">
          {dataset.name}
        </AppLink>
        <Text size="2" className="sl-clamp-3">
          {dataset.description}
        </Text>
        <ColumnBadges columns={dataset.columns} />
        <Text size="2" color="gray">
          {dataset.rowCount} rows, {formatDecimalYear(dataset.timeRange.from)} to{' '}
          {formatDecimalYear(dataset.timeRange.to)}. Imported by {dataset.createdBy.displayName},{' '}
          <DateTime value={dataset.createdAt} />.
        </Text>
      </Flex>
    </Card>
  );
}

/** The desk's datasets: what each holds, over which years, and who brought it in. */
export function DatasetsIndex({ role }: { role: Role }) {
  const datasets = useDatasets();
  const mayImport = mayImportDataset(role);
  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title="Datasets"
        purpose="Time series uploaded as CSV files, typed row by row, for the workbench’s trend and comparison workings to read."
        action={
          mayImport ? (
            <Button asChild highContrast>
              <RouterLink to={paths.app.newDataset.getHref()}>
                <PlusIcon aria-hidden />
                Import a dataset
              </RouterLink>
            </Button>
          ) : null
        }
      />
      {datasets.isPending ? (
        <Flex align="center" gap="3" role="status">
          <Spinner />
          <Text color="gray">Loading the datasets…</Text>
        </Flex>
      ) : datasets.isError ? (
        <Callout.Root color="red" role="alert">
          <Callout.Text>{errorMessage(datasets.error)}</Callout.Text>
        </Callout.Root>
      ) : datasets.data.length === 0 ? (
        <Text as="p" color="gray">
          No datasets on the desk yet.
          {mayImport ? ' Import one from a CSV file with a time column and columns of values.' : ''}
        </Text>
      ) : (
        <>
          {/* A table where there is room for one; stacked cards on a phone. */}
          <Box display={{ initial: 'none', md: 'block' }}>
            <Table.Root variant="surface">
              <VisuallyHidden asChild>
                <caption>Datasets on the desk, newest first</caption>
              </VisuallyHidden>
              <Table.Header>
                <Table.Row>
                  <Table.ColumnHeaderCell minWidth="14rem">Name</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell minWidth="16rem">Description</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell>Columns (unit)</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell>Rows</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell className="sl-nowrap">Time range</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell>Imported</Table.ColumnHeaderCell>
                </Table.Row>
              </Table.Header>
              <Table.Body>
                {datasets.data.map((dataset) => (
                  <DatasetRow key={dataset.id} dataset={dataset} />
                ))}
              </Table.Body>
            </Table.Root>
          </Box>
          <Box display={{ initial: 'block', md: 'none' }}>
            <ul className="sl-card-list" aria-label="Datasets on the desk, newest first">
              {datasets.data.map((dataset) => (
                <li key={dataset.id}>
                  <DatasetCard dataset={dataset} />
                </li>
              ))}
            </ul>
          </Box>
        </>
      )}
    </Flex>
  );
}
