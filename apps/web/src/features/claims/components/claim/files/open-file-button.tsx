import { DownloadIcon } from '@radix-ui/react-icons';
import { Button, Text } from '@radix-ui/themes';
import type { AttachmentView } from '@skyledger/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { errorMessage } from '@/lib/api-error-messages';
import { saveBlob } from '@/lib/save-blob';
import { attachmentBlobQueryOptions } from '../../../api/get-attachment-blob';

interface OpenFileButtonProps {
  attachment: AttachmentView;
  label?: string;
}

/** Downloads an evidence file under its original name; the API wants the token, a link could not. */
export function OpenFileButton({ attachment, label }: OpenFileButtonProps) {
  const queryClient = useQueryClient();
  const [state, setState] = useState<{ busy: boolean; error?: string }>({ busy: false });
  const download = () => {
    setState({ busy: true });
    queryClient.fetchQuery(attachmentBlobQueryOptions(attachment.id)).then(
      (blob) => {
        saveBlob(blob, attachment.originalName);
        setState({ busy: false });
      },
      (error: unknown) => setState({ busy: false, error: errorMessage(error) }),
    );
  };
  return (
    <>
      <Button
        size="1"
        variant="soft"
        color="gray"
        highContrast
        loading={state.busy}
        onClick={download}
      >
        <DownloadIcon aria-hidden />
        {label ?? `Download ${attachment.originalName}`}
      </Button>
      {state.error ? (
        <Text size="2" color="red" role="alert">
          {state.error}
        </Text>
      ) : null}
    </>
  );
}
