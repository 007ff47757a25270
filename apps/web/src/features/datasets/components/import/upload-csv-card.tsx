import { UploadIcon } from '@radix-ui/react-icons';
import { Box, Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { DatasetUploadView } from '@skyledger/contracts';
import { useState } from 'react';
import { FileField } from '@/components/ui/file-field';
import { ProgressLine } from '@/components/ui/progress-line';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { formatBytes } from '@/lib/format-bytes';
import { useUploadDatasetFile } from '../../api/upload-dataset-file';

const csvOnly =
  'The desk imports datasets from CSV files only: a header row, then rows of the same width.';
const fileWords = { file: { unsupportedType: csvOnly, typeMismatch: csvOnly } };

interface UploadCsvCardProps {
  /** The file uploaded last, if any. */
  uploaded: DatasetUploadView | null;
  onUploaded: (upload: DatasetUploadView) => void;
}

/** Step one: the CSV goes up and is kept; the API answers its columns and first rows. */
export function UploadCsvCard({ uploaded, onUploaded }: UploadCsvCardProps) {
  const upload = useUploadDatasetFile();
  const [file, setFile] = useState<File | null>(null);
  const [error, setError] = useState<string | undefined>();
  const [sent, setSent] = useState<number>();

  return (
    <Card size="3">
      <form
        aria-label="Upload a CSV file"
        noValidate
        onSubmit={(event) => {
          event.preventDefault();
          if (!file) return setError('Choose a CSV file to upload');
          upload.mutate(
            { file, onProgress: setSent },
            {
              onSuccess: onUploaded,
              onError: (cause) => setError(changeErrorMessage(cause, '', fileWords)),
            },
          );
        }}
      >
        <Flex direction="column" gap="3">
          <Heading as="h2" size="4">
            1. Upload the CSV file
          </Heading>
          <FileField
            label={uploaded ? 'Another CSV file, to replace it' : 'CSV file'}
            accept=".csv,text/csv"
            hint="A header row naming each column, a column of years (1998, 1998.5) or dates (1998-07, 1998-07-15), and columns of numbers."
            error={error}
            onFileChange={(chosen) => {
              setFile(chosen);
              setError(undefined);
            }}
          />
          <Flex gap="3" align="center" wrap="wrap">
            <Button type="submit" highContrast loading={upload.isPending}>
              <UploadIcon aria-hidden />
              Upload
            </Button>
            <Box role="status" flexGrow="1">
              {upload.isPending && file ? (
                <ProgressLine
                  label={
                    sent === 1
                      ? `Reading the columns of ${file.name}…`
                      : `Uploading ${file.name} (${formatBytes(file.size)})`
                  }
                  fraction={sent === 1 ? undefined : sent}
                />
              ) : uploaded ? (
                <Text size="2" color="gray">
                  Uploaded {uploaded.attachment.originalName}: {uploaded.columns.length} columns,{' '}
                  {uploaded.rowCount} rows below the header.
                </Text>
              ) : null}
            </Box>
          </Flex>
        </Flex>
      </form>
    </Card>
  );
}
