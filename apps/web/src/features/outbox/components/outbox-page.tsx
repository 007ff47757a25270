import { Flex, Text } from '@radix-ui/themes';
import { outboxStates, type OutboxQuery, type OutboxState } from '@skyledger/contracts';
import { useNavigation, useSearchParams } from 'react-router-dom';
import { CardsOrTable } from '@/components/ui/cards-or-table';
import { CountTabNav } from '@/components/ui/count-tab-nav';
import { useShowNotice } from '@/components/ui/toaster';
import { PagePager } from '@/components/ui/page-pager';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { outboxSearchParams, parseOutboxSearch, useOutbox } from '../api/get-outbox';
import { OutboxCards } from './outbox-cards';
import { OutboxTable } from './outbox-table';
import { outboxStateLabels } from './outbox-words';

function StateTabs({ query, counts }: { query: OutboxQuery; counts: Record<OutboxState, number> }) {
  return (
    <CountTabNav
      label="Mails by state"
      keys={outboxStates}
      names={outboxStateLabels}
      counts={counts}
      current={query.state}
      hrefOf={(state) => paths.app.outbox.getHref(outboxSearchParams({ state }))}
    />
  );
}

/** Every mail the desk sends, with its delivery state; failed and waiting ones can go again. */
export function OutboxPage() {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = parseOutboxSearch(searchParams);
  const { data } = useOutbox(query);
  const navigation = useNavigation();
  const showNotice = useShowNotice();
  const busy =
    navigation.state === 'loading' && navigation.location.pathname === paths.app.outbox.path;

  const stateWords = query.state ? outboxStateLabels[query.state].toLowerCase() : null;
  const label = stateWords ? `Mails: ${stateWords}` : 'Mails';

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
            <Text>{stateWords ? `No mails are ${stateWords}.` : 'No mails yet.'}</Text>
          ) : (
            <CardsOrTable
              cards={<OutboxCards label={label} messages={data.items} onNotice={showNotice} />}
              table={<OutboxTable caption={label} messages={data.items} onNotice={showNotice} />}
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
