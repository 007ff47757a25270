import { Flex, RadioGroup } from '@radix-ui/themes';
import type { DatasetSummary } from '@skyledger/contracts';
import { SelectField } from '@/components/ui/select-field';
import { TextAreaField } from '@/components/ui/text-area-field';
import { useDatasets } from '@/features/datasets/api/get-datasets';
import { formatDecimalYear } from '@/features/datasets/decimal-year';
import type { SeriesSource } from '../../form/form-state';
import { unitLabel } from '../../form/unit-choices';

interface SeriesSourceFieldsProps {
  /** What the series is called in the form, to tell several apart. */
  label: string;
  source: SeriesSource;
  onChange: (source: SeriesSource, unit?: string) => void;
  error?: string;
}

function datasetFacts(dataset: DatasetSummary): string {
  return `${dataset.description} ${dataset.rowCount} rows, ${formatDecimalYear(dataset.timeRange.from)} to ${formatDecimalYear(dataset.timeRange.to)}.`;
}

/**
 * Where one series comes from: a column of a dataset on the desk (saved as a reference the
 * server reads again), or points pasted as `t,y` lines. A chosen column also passes its
 * unit up, so the form can label the result with it.
 */
export function SeriesSourceFields({ label, source, onChange, error }: SeriesSourceFieldsProps) {
  const datasets = useDatasets();
  const dataset = datasets.data?.find((candidate) => candidate.id === source.datasetId);
  const chooseDataset = (datasetId: string) => {
    const chosen = datasets.data?.find((candidate) => candidate.id === datasetId);
    // A dataset of one column leaves nothing to choose.
    const only = chosen?.columns.length === 1 ? chosen.columns[0] : undefined;
    onChange({ ...source, datasetId, column: only?.key ?? '' }, only?.unit);
  };
  return (
    <Flex direction="column" gap="3">
      <RadioGroup.Root
        value={source.from}
        onValueChange={(from) =>
          onChange({ ...source, from: from === 'pasted' ? 'pasted' : 'dataset' })
        }
        aria-label={`Where the points of ${label} come from`}
        orientation="horizontal"
      >
        <Flex gap="4" wrap="wrap">
          <RadioGroup.Item value="dataset">A dataset on the desk</RadioGroup.Item>
          <RadioGroup.Item value="pasted">Points I paste</RadioGroup.Item>
        </Flex>
      </RadioGroup.Root>
      {source.from === 'dataset' ? (
        <>
          <SelectField
            label="Dataset"
            value={source.datasetId}
            placeholder={datasets.isPending ? 'Loading the datasets…' : 'Choose a dataset'}
            disabled={!datasets.data || datasets.data.length === 0}
            options={(datasets.data ?? []).map((candidate) => ({
              value: candidate.id,
              label: candidate.name,
            }))}
            onValueChange={chooseDataset}
            hint={
              datasets.isError
                ? 'The datasets could not be loaded; paste points instead, or reload the page.'
                : datasets.data?.length === 0
                  ? 'There are no datasets on the desk yet; paste points instead.'
                  : dataset
                    ? datasetFacts(dataset)
                    : undefined
            }
            error={source.datasetId ? undefined : error}
          />
          {dataset ? (
            <SelectField
              label="Column"
              value={source.column}
              placeholder="Choose a column"
              options={dataset.columns.map((column) => ({
                value: column.key,
                label: column.unit ? `${column.label} (${unitLabel(column.unit)})` : column.label,
              }))}
              onValueChange={(column) =>
                onChange(
                  { ...source, column },
                  dataset.columns.find((candidate) => candidate.key === column)?.unit,
                )
              }
              error={source.datasetId ? error : undefined}
            />
          ) : null}
        </>
      ) : (
        <TextAreaField
          label="Points, one “t,y” per line"
          hint="t as a decimal year (1998, or 1998.54 for mid-July), then the value. A first line of column names is skipped."
          placeholder={'1979,0.12\n1980,0.05\n1981,0.18'}
          rows={6}
          value={source.text}
          onChange={(event) => onChange({ ...source, text: event.target.value })}
          error={error}
          className="sl-wb-mono"
        />
      )}
    </Flex>
  );
}
