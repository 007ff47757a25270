import type { DatasetUploadView } from '@skyledger/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Step one of an import: the CSV as multipart field `file`; the API answers its columns. */
export function uploadDatasetFile(
  file: File,
  onProgress?: (fraction: number) => void,
): Promise<DatasetUploadView> {
  const form = new FormData();
  form.set('file', file, file.name);
  return api.post<DatasetUploadView>('/datasets/uploads', form, { onUploadProgress: onProgress });
}

export function useUploadDatasetFile() {
  return useMutation({
    mutationFn: ({ file, onProgress }: { file: File; onProgress?: (fraction: number) => void }) =>
      uploadDatasetFile(file, onProgress),
  });
}
