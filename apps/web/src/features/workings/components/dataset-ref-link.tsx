import { Text } from '@radix-ui/themes';
import type { DatasetSeriesRef } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { paths } from '@/config/paths';
import { useDatasets } from '@/features/datasets/api/get-datasets';

/** "column Station anomaly (anomaly_k) of SYNTHETIC Marrowby station…", the name a link. */
export function DatasetRefLink({ datasetRef }: { datasetRef: DatasetSeriesRef }) {
  const datasets = useDatasets();
  const dataset = datasets.data?.find((candidate) => candidate.id === datasetRef.dataset);
  const column = dataset?.columns.find((candidate) => candidate.key === datasetRef.column);
  const columnName =
    column && column.label !== column.key
      ? `“${column.label}” (${column.key})`
      : `“${datasetRef.column}”`;
  return (
    <Text>
      column {columnName} of{' '}
      <AppLink to={paths.app.dataset.getHref(datasetRef.dataset)} className="sl-break">
        {dataset?.name ?? (datasets.isPending ? 'a dataset (loading its name…)' : 'a dataset')}
      </AppLink>
    </Text>
  );
}
