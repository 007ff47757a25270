import type { CreateDatasetRequest, DatasetDetail } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { datasetKeys } from './dataset-keys';

/** Step two: the chosen columns; the API types every row, or refuses the whole file. */
export function createDataset(body: CreateDatasetRequest): Promise<DatasetDetail> {
  return api.post<DatasetDetail>('/datasets', body);
}

export function useCreateDataset() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDataset,
    onSuccess: (dataset) => {
      queryClient.setQueryData(datasetKeys.detail(dataset.id), dataset);
      return queryClient.invalidateQueries({ queryKey: datasetKeys.lists() });
    },
  });
}
