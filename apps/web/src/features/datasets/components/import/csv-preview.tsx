import { Flex, Text } from '@radix-ui/themes';
import type { DatasetUploadView } from '@skyledger/contracts';
import { ScrollTable } from '@/components/ui/scroll-table';

/** The file's header and first rows as they are written, before anything is typed. */
export function CsvPreview({ upload }: { upload: DatasetUploadView }) {
  const caption = `The first ${upload.previewRows.length} of ${upload.rowCount} rows of ${upload.attachment.originalName}, as written`;
  return (
    <Flex direction="column" gap="1">
      <ScrollTable
        caption={caption}
        columns={upload.columns}
        rows={upload.previewRows.map((row) => upload.columns.map((_, cell) => row[cell] ?? ''))}
      />
      <Text as="p" size="1" color="gray">
        {caption}.
      </Text>
    </Flex>
  );
}
