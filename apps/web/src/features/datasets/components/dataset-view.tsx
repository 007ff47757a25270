import { Card, DataList, Flex, Heading, Text } from '@radix-ui/themes';
import type { DatasetDetail } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import { DocumentTitle } from '@/components/ui/document-title';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useDataset } from '../api/get-dataset';
import { formatDecimalYear } from '../decimal-year';
import { ColumnBadges } from './column-badges';
import { DownloadCsvButton } from './download-csv-button';
import { SeriesChart } from './series-chart';

function columnPoints(dataset: DatasetDetail, index: number) {
  return dataset.rows.map((row) => ({ t: row[0]!, y: row[index + 1]! }));
}

/** One dataset: where it came from, its columns with units, and a chart of each. */
export function DatasetView({ datasetId }: { datasetId: string }) {
  const { data: dataset } = useDataset(datasetId);
  return (
    <Flex direction="column" gap="5">
      <DocumentTitle title={dataset.name} />
      <PageHeader
        above={
          // High contrast: the accent colour is too faint on the page's grey background.
          <AppLink to={paths.app.datasets.getHref()} size="2" highContrast>
            All datasets
          </AppLink>
        }
        title={dataset.name}
        purpose="One series on the desk: where it came from, its columns with their units, and a chart of each. Trend and comparison workings in the workbench read it by name."
      />
      <Card size="3">
        <Flex direction="column" gap="4">
          <Text as="p" className="sl-prose sl-pre-line">
            {dataset.description}
          </Text>
          <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }}>
            <DataList.Item>
              <DataList.Label>Columns</DataList.Label>
              <DataList.Value>
                <ColumnBadges columns={dataset.columns} />
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Time</DataList.Label>
              <DataList.Value>
                {formatDecimalYear(dataset.timeRange.from)} to{' '}
                {formatDecimalYear(dataset.timeRange.to)}, from the column “{dataset.timeColumn}”
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Rows</DataList.Label>
              <DataList.Value>{dataset.rowCount}</DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Imported</DataList.Label>
              <DataList.Value>
                {/* One inline run: the value lays its children out as flex items. */}
                <span>
                  {dataset.createdBy.displayName}, <DateTime value={dataset.createdAt} />
                </span>
              </DataList.Value>
            </DataList.Item>
          </DataList.Root>
          <DownloadCsvButton dataset={dataset} />
        </Flex>
      </Card>
      <Flex direction="column" gap="4">
        <Heading as="h2" size="5">
          The columns against time
        </Heading>
        {dataset.columns.map((column, index) => (
          <Card key={column.key} size="3">
            <SeriesChart
              label={column.label}
              unit={column.unit}
              points={columnPoints(dataset, index)}
              restAt="in the CSV download above"
            />
          </Card>
        ))}
      </Flex>
    </Flex>
  );
}
