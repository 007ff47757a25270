import { DownloadIcon } from '@radix-ui/react-icons';
import { Button, Flex, Text } from '@radix-ui/themes';
import type { DatasetSummary } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { attachmentBlobQueryOptions } from '@/features/claims/api/get-attachment-blob';
import { errorMessage } from '@/lib/api-error-messages';
import { saveBlob } from '@/lib/save-blob';

/** A file name for the download from the dataset's name: letters, digits and dashes. */
function csvFileName(name: string): string {
  const stem = name
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .replace(/[\s_]+/g, '-')
    .toLowerCase();
  return `${stem || 'dataset'}.csv`;
}

/** The CSV as it was uploaded; the API wants the token, so a plain link could not fetch it. */
export function DownloadCsvButton({ dataset }: { dataset: DatasetSummary }) {
  const queryClient = useQueryClient();
  const download = useMutation({
    mutationFn: () => queryClient.fetchQuery(attachmentBlobQueryOptions(dataset.attachmentId)),
    onSuccess: (blob) => saveBlob(blob, csvFileName(dataset.name)),
  });
  return (
    <Flex direction="column" gap="1" align="start">
      <Button
        variant="soft"
        color="gray"
        highContrast
        loading={download.isPending}
        onClick={() => download.mutate()}
      >
        <DownloadIcon aria-hidden />
        Download the original CSV
      </Button>
      {download.isError ? (
        <Text size="2" color="red" role="alert">
          {errorMessage(download.error)}
        </Text>
      ) : null}
    </Flex>
  );
}
