import { Card, DataList, Flex, Text } from '@radix-ui/themes';
import type { OutboxMessageView } from '@skyledger/contracts';
import type { ShowNotice } from '@/components/ui/toaster';
import { MailAddress, MailStateBadge, MailTiming } from './mail-facts';
import { outboxKindLabel } from './outbox-words';
import { RetryButton } from './retry-button';

interface OutboxCardsProps {
  label: string;
  messages: readonly OutboxMessageView[];
  onNotice: ShowNotice;
}

/** The outbox on a phone: each mail as a card with the table's facts and its retry. */
export function OutboxCards({ label, messages, onNotice }: OutboxCardsProps) {
  return (
    <ul className="sl-card-list" aria-label={label}>
      {messages.map((message) => (
        <li key={message.id}>
          <Card size="2">
            <Flex direction="column" gap="3" align="start">
              <Flex gap="2" align="center" wrap="wrap">
                <MailStateBadge state={message.state} />
                <Text size="1" color="gray">
                  {outboxKindLabel(message.kind)}
                </Text>
              </Flex>
              <Text weight="bold" className="sl-break">
                {message.subject}
              </Text>
              <DataList.Root size="2">
                <DataList.Item>
                  <DataList.Label minWidth="96px">To</DataList.Label>
                  <DataList.Value className="sl-break">
                    <MailAddress address={message.to} />
                  </DataList.Value>
                </DataList.Item>
                <DataList.Item>
                  <DataList.Label minWidth="96px">Attempts</DataList.Label>
                  <DataList.Value>{message.attempts}</DataList.Value>
                </DataList.Item>
                <DataList.Item>
                  <DataList.Label minWidth="96px">Last error</DataList.Label>
                  <DataList.Value className="sl-break">
                    {message.lastError ?? <Text color="gray">None</Text>}
                  </DataList.Value>
                </DataList.Item>
                <DataList.Item>
                  <DataList.Label minWidth="96px">Next attempt / sent</DataList.Label>
                  <DataList.Value>
                    <MailTiming message={message} />
                  </DataList.Value>
                </DataList.Item>
              </DataList.Root>
              <RetryButton message={message} onNotice={onNotice} />
            </Flex>
          </Card>
        </li>
      ))}
    </ul>
  );
}
