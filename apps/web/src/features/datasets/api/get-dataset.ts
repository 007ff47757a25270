import type { DatasetDetail } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { datasetKeys } from './dataset-keys';

export function getDataset(id: string): Promise<DatasetDetail> {
  return api.get<DatasetDetail>(`/datasets/${encodeURIComponent(id)}`);
}

export const datasetQueryOptions = (id: string) =>
  queryOptions({ queryKey: datasetKeys.detail(id), queryFn: () => getDataset(id) });

export function useDataset(id: string) {
  return useSuspenseQuery(datasetQueryOptions(id));
}
