import type { NamedSeries } from '@skyledger/calc';
import type { DatasetDetail } from '@skyledger/contracts';
import { useQueries, type UseQueryResult } from '@tanstack/react-query';
import { useCallback } from 'react';
import { datasetQueryOptions } from '@/features/datasets/api/get-dataset';
import type { ResolveDataset } from '../form/build-inputs';
import type { FormState, SeriesSource } from '../form/form-state';

function chosenSources(form: FormState): SeriesSource[] {
  return Object.values(form).flatMap((field) =>
    field.kind === 'series'
      ? [field.source]
      : field.kind === 'seriesList'
        ? field.items.map((item) => item.source)
        : [],
  );
}

/** One column of a dataset as a named series: rows are `[t, value of column 0, …]`. */
export function datasetSeries(dataset: DatasetDetail, column: string): NamedSeries | undefined {
  const index = dataset.columns.findIndex((candidate) => candidate.key === column);
  if (index < 0) return undefined;
  const label = dataset.columns[index]?.label || column;
  return {
    name: label,
    points: dataset.rows.map((row) => ({
      t: row[0] ?? Number.NaN,
      y: row[index + 1] ?? Number.NaN,
    })),
  };
}

const byId = (results: UseQueryResult<DatasetDetail>[]) =>
  results.flatMap((result) => (result.data ? [result.data] : []));

/**
 * Loads the datasets the form's series read from, for the browser's own runs, and answers
 * a resolver that reads a column of one of them (undefined while it loads).
 */
export function useChosenDatasets(form: FormState): ResolveDataset {
  const ids = [
    ...new Set(
      chosenSources(form).flatMap((source) =>
        source.from === 'dataset' && source.datasetId ? [source.datasetId] : [],
      ),
    ),
  ];
  const datasets = useQueries({
    queries: ids.map((id) => datasetQueryOptions(id)),
    combine: byId,
  });
  const resolve = useCallback<ResolveDataset>(
    (datasetId, column) => {
      const dataset = datasets.find((candidate) => candidate.id === datasetId);
      return dataset ? datasetSeries(dataset, column) : undefined;
    },
    [datasets],
  );
  return resolve;
}
