import { UploadIcon } from '@radix-ui/react-icons';
import { Box, Button, Card, Flex } from '@radix-ui/themes';
import { useState } from 'react';
import { FileField } from '@/components/ui/file-field';
import { ProgressLine } from '@/components/ui/progress-line';
import { formatBytes } from '@/lib/format-bytes';
import type { ShowNotice } from '@/components/ui/toaster';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useUploadAttachment } from '../../../api/upload-attachment';
import {
  evidenceFileAccept,
  evidenceFileHint,
  looksLikeEvidenceFile,
} from '../../../forms/evidence-file';
import { staleClaimMessage } from '../claim-messages';

/** Uploads one evidence file to the claim; the API reads its type from the bytes. */
export function UploadEvidenceForm({
  claimId,
  onNotice,
}: {
  claimId: string;
  onNotice: ShowNotice;
}) {
  const upload = useUploadAttachment(claimId);
  const [file, setFile] = useState<File | null>(null);
  const [error, setError] = useState<string | undefined>();
  // A new key empties the file input after an upload: its value cannot be set from script.
  const [inputKey, setInputKey] = useState(0);
  const [sent, setSent] = useState<number>();

  return (
    <Card size="2">
      <form
        aria-label="Upload an evidence file"
        noValidate
        onSubmit={(event) => {
          event.preventDefault();
          if (!file) return setError('Choose a file to upload');
          if (!looksLikeEvidenceFile(file)) return setError(`Choose a ${evidenceFileHint} file`);
          upload.mutate(
            { file, onProgress: setSent },
            {
              onSuccess: (uploaded) => {
                setFile(null);
                setInputKey((key) => key + 1);
                onNotice({ tone: 'success', text: `${uploaded.originalName} is uploaded.` });
              },
              onError: (cause) => setError(changeErrorMessage(cause, staleClaimMessage)),
            },
          );
        }}
      >
        <Flex direction="column" gap="3">
          <FileField
            key={inputKey}
            label="Evidence file"
            accept={evidenceFileAccept}
            hint={`${evidenceFileHint}, up to 20 MB unless the desk set another limit`}
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
                  label={`Uploading ${file.name} (${formatBytes(file.size)})`}
                  fraction={sent}
                />
              ) : null}
            </Box>
          </Flex>
        </Flex>
      </form>
    </Card>
  );
}
