import { UploadIcon } from '@radix-ui/react-icons';
import { Button, Text } from '@radix-ui/themes';
import type { AppearanceView } from '@skyledger/contracts';
import { useState } from 'react';
import { FileField } from '@/components/ui/file-field';
import type { ShowNotice } from '@/components/ui/live-notice';
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
          { appearance, file, onUploaded: () => setUploaded(true) },
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
      <Text role="status" size="2" color="gray">
        {attach.isPending ? (uploaded ? 'Attaching it to the appearance…' : 'Uploading…') : ''}
      </Text>
    </FormDialog>
  );
}
