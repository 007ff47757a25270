import { Badge, Button, Flex, Text } from '@radix-ui/themes';
import {
  outboxStates,
  type OutboxMessageView,
  type OutboxQuery,
  type OutboxState,
} from '@skyledger/contracts';
import { useNavigation, useSearchParams } from 'react-router-dom';
import { CountTabNav } from '@/components/ui/count-tab-nav';
import { DateTime } from '@/components/ui/date-time';
import { useShowNotice, type ShowNotice } from '@/components/ui/toaster';
import { PagePager } from '@/components/ui/page-pager';
import { ScrollTable } from '@/components/ui/scroll-table';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/api-error-messages';
import { outboxSearchParams, parseOutboxSearch, useOutbox } from '../api/get-outbox';
import { useRetryOutboxMessage } from '../api/retry-outbox-message';
import { outboxKindLabel, outboxStateColors, outboxStateLabels } from './outbox-words';

function StateTabs({ query, counts }: { query: OutboxQuery; counts: Record<OutboxState, number> }) {
  const tab = (state: OutboxState | undefined, label: string, count: number) => ({
    label,
    count,
    to: paths.app.outbox.getHref(outboxSearchParams({ state })),
    active: query.state === state,
  });
  const all = outboxStates.reduce((sum, state) => sum + counts[state], 0);
  return (
    <CountTabNav
      label="Mails by state"
      tabs={[
        tab(undefined, 'All', all),
        ...outboxStates.map((state) => tab(state, outboxStateLabels[state], counts[state])),
      ]}
    />
  );
}

function RetryButton({ message, onNotice }: { message: OutboxMessageView; onNotice: ShowNotice }) {
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

/** Every mail the desk sends, with its delivery state; failed and waiting ones can go again. */
export function OutboxPage() {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = parseOutboxSearch(searchParams);
  const { data } = useOutbox(query);
  const navigation = useNavigation();
  const showNotice = useShowNotice();
  const busy =
    navigation.state === 'loading' && navigation.location.pathname === paths.app.outbox.path;

  const rows = data.items.map((message) => [
    outboxKindLabel(message.kind),
    // A narrow column breaks an address after its @, not in the middle of a name.
    <>
      {message.to.split('@')[0]}@<wbr />
      {message.to.split('@').slice(1).join('@')}
    </>,
    message.subject,
    <Badge color={outboxStateColors[message.state]} variant="soft" highContrast>
      {outboxStateLabels[message.state]}
    </Badge>,
    message.attempts,
    message.lastError ? <span className="sl-break">{message.lastError}</span> : '—',
    message.sentAt ? (
      <>
        Sent <DateTime value={message.sentAt} />
      </>
    ) : message.state === 'failed' ? (
      'Not until retried'
    ) : (
      <DateTime value={message.nextAttemptAt} />
    ),
    <RetryButton message={message} onNotice={showNotice} />,
  ]);

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title="Outbox"
        purpose="Every mail the desk sends is queued here with the change it reports, then delivered with retries. A failed mail waits until you retry it."
      />
      <StateTabs query={query} counts={data.counts} />
      <Flex direction="column">
        <Flex direction="column" gap="3" aria-busy={busy} className={busy ? 'sl-busy' : undefined}>
          {data.total === 0 ? (
            <Text>
              {query.state
                ? `No mails are ${outboxStateLabels[query.state].toLowerCase()}.`
                : 'No mails yet.'}
            </Text>
          ) : (
            <ScrollTable
              caption={
                query.state ? `Mails: ${outboxStateLabels[query.state].toLowerCase()}` : 'Mails'
              }
              columns={columns}
              rows={rows}
              full
            />
          )}
          <PagePager
            label="Pages of the outbox"
            noun="Mails"
            page={data.page}
            pageSize={data.pageSize}
            total={data.total}
            onPage={(page) => setSearchParams(outboxSearchParams({ ...query, page }))}
          />
        </Flex>
      </Flex>
    </Flex>
  );
}
