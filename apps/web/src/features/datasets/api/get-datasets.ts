import type { DatasetSummary } from '@skyledger/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { datasetKeys } from './dataset-keys';

/** Every dataset on the desk, newest first. */
export function getDatasets(): Promise<DatasetSummary[]> {
  return api.get<DatasetSummary[]>('/datasets');
}

export const datasetsQueryOptions = () =>
  queryOptions({ queryKey: datasetKeys.lists(), queryFn: getDatasets });

/** Not suspending: the list page and the workings that name datasets show their own loading. */
export function useDatasets() {
  return useQuery(datasetsQueryOptions());
}
