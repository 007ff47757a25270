import { UploadIcon } from '@radix-ui/react-icons';
import { Box, Button } from '@radix-ui/themes';
import type { AppearanceView } from '@skyledger/contracts';
import { useState } from 'react';
import { FileField } from '@/components/ui/file-field';
import { ProgressLine } from '@/components/ui/progress-line';
import type { ShowNotice } from '@/components/ui/toaster';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useAttachCapture } from '../../../api/attach-capture';
import {
  evidenceFileAccept,
  evidenceFileHint,
  looksLikeEvidenceFile,
} from '../../../forms/evidence-file';
import { FormDialog } from '../../shared/form-dialog';
import { staleClaimMessage } from '../claim-messages';

interface AttachCaptureDialogProps {
  claimId: string;
  appearance: AppearanceView;
  onNotice: ShowNotice;
}

/** Uploads a saved copy of the page where the claim appeared and ties it to that appearance. */
export function AttachCaptureDialog({ claimId, appearance, onNotice }: AttachCaptureDialogProps) {
  const [open, setOpen] = useState(false);
  const [file, setFile] = useState<File | null>(null);
  const [error, setError] = useState<string | undefined>();
  const [uploaded, setUploaded] = useState(false);
  const [sent, setSent] = useState<number>();
  const attach = useAttachCapture(claimId);

  const close = (next: boolean) => {
    setOpen(next);
    if (!next) {
      setFile(null);
      setError(undefined);
    }
  };

  return (
    <FormDialog
      trigger={
        <Button size="1" variant="soft" highContrast>
          <UploadIcon aria-hidden />
          Attach a capture
        </Button>
      }
      title={`Capture of ${appearance.outlet}`}
      description="A screenshot or saved copy of the page, kept as evidence with its SHA-256."
      open={open}
      onOpenChange={close}
      submitLabel="Upload and attach"
      submitting={attach.isPending}
      formError={undefined}
      onSubmit={(event) => {
        event.preventDefault();
        if (!file) return setError('Choose a file to upload');
        if (!looksLikeEvidenceFile(file)) return setError(`Choose a ${evidenceFileHint} file`);
        setUploaded(false);
        attach.mutate(
          { appearance, file, onUploaded: () => setUploaded(true), onProgress: setSent },
          {
            onSuccess: () => {
              close(false);
              onNotice({
                tone: 'success',
                text: `The capture of ${appearance.outlet} is attached.`,
              });
            },
            onError: (cause) => setError(changeErrorMessage(cause, staleClaimMessage)),
          },
        );
      }}
    >
      <FileField
        label="Capture file"
        accept={evidenceFileAccept}
        hint={evidenceFileHint}
        error={error}
        onFileChange={(chosen) => {
          setFile(chosen);
          setError(undefined);
        }}
      />
      <Box role="status">
        {attach.isPending ? (
          <ProgressLine
            label={uploaded ? 'Attaching it to the appearance…' : 'Uploading…'}
            fraction={uploaded ? undefined : sent}
          />
        ) : null}
      </Box>
    </FormDialog>
  );
}
