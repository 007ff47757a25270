import { Button } from '@radix-ui/themes';
import type { OutboxMessageView } from '@skyledger/contracts';
import type { ShowNotice } from '@/components/ui/toaster';
import { errorMessage } from '@/lib/api-error-messages';
import { useRetryOutboxMessage } from '../api/retry-outbox-message';

/** Puts a failed or waiting mail back in line now; nothing for one sent or being sent. */
export function RetryButton({
  message,
  onNotice,
}: {
  message: OutboxMessageView;
  onNotice: ShowNotice;
}) {
  const retry = useRetryOutboxMessage();
  if (message.state !== 'failed' && message.state !== 'pending') return null;
  return (
    <Button
      size="1"
      variant="soft"
      color="gray"
      highContrast
      loading={retry.isPending}
      aria-label={`Retry the mail to ${message.to}: ${message.subject}`}
      onClick={() =>
        retry.mutate(message.id, {
          onSuccess: () =>
            onNotice({ tone: 'success', text: `The mail to ${message.to} is back in line.` }),
          onError: (error) => onNotice({ tone: 'problem', text: errorMessage(error) }),
        })
      }
    >
      Retry
    </Button>
  );
}
