import type { OutboxMessageView } from '@skyledger/contracts';
import { ScrollTable } from '@/components/ui/scroll-table';
import type { ShowNotice } from '@/components/ui/toaster';
import { MailAddress, MailStateBadge, MailTiming } from './mail-facts';
import { outboxKindLabel } from './outbox-words';
import { RetryButton } from './retry-button';

const columns = [
  'Kind',
  'To',
  'Subject',
  'State',
  'Attempts',
  'Last error',
  'Next attempt / sent at',
  'Action',
];

interface OutboxTableProps {
  caption: string;
  messages: readonly OutboxMessageView[];
  onNotice: ShowNotice;
}

export function OutboxTable({ caption, messages, onNotice }: OutboxTableProps) {
  const rows = messages.map((message) => [
    outboxKindLabel(message.kind),
    <MailAddress address={message.to} />,
    message.subject,
    <MailStateBadge state={message.state} />,
    message.attempts,
    message.lastError ? <span className="sl-break">{message.lastError}</span> : '—',
    <MailTiming message={message} />,
    <RetryButton message={message} onNotice={onNotice} />,
  ]);
  return <ScrollTable caption={caption} columns={columns} rows={rows} full />;
}
