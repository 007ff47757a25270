import type { DatasetUploadView } from '@skyledger/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Step one of an import: the CSV as multipart field `file`; the API answers its columns. */
export function uploadDatasetFile(file: File): Promise<DatasetUploadView> {
  const form = new FormData();
  form.set('file', file, file.name);
  return api.post<DatasetUploadView>('/datasets/uploads', form);
}

export function useUploadDatasetFile() {
  return useMutation({ mutationFn: uploadDatasetFile });
}
