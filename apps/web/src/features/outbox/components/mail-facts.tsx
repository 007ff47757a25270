import { Badge } from '@radix-ui/themes';
import type { OutboxMessageView, OutboxState } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { outboxStateColors, outboxStateLabels } from './outbox-words';

export function MailStateBadge({ state }: { state: OutboxState }) {
  return (
    <Badge color={outboxStateColors[state]} variant="soft" highContrast>
      {outboxStateLabels[state]}
    </Badge>
  );
}

/** An address that breaks after its @, not in the middle of a name, where space is short. */
export function MailAddress({ address }: { address: string }) {
  const [name, ...domain] = address.split('@');
  return (
    <span>
      {name}@<wbr />
      {domain.join('@')}
    </span>
  );
}

/** When the mail was sent, or when it is next tried; a failed one waits for a person. */
export function MailTiming({ message }: { message: OutboxMessageView }) {
  if (message.sentAt) {
    return (
      <span>
        Sent <DateTime value={message.sentAt} />
      </span>
    );
  }
  if (message.state === 'failed') return <>Not until retried</>;
  return <DateTime value={message.nextAttemptAt} />;
}
