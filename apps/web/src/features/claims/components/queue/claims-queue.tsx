import { PlusIcon } from '@radix-ui/react-icons';
import { Button, Flex } from '@radix-ui/themes';
import type { ClaimQueueQuery, CurrentUser } from '@skyledger/contracts';
import { useState } from 'react';
import { Link as RouterLink, useNavigation, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useClaims } from '../../api/get-claims';
import {
  isFiltered,
  parseQueueSearch,
  queueSearchParams,
  withFilters,
} from '../../api/queue-search';
import { hasClaimRole } from '../../claim-permissions';
import { QueueEmpty } from './queue-empty';
import { QueueFilters } from './queue-filters';
import { QueueStatusTabs } from './queue-status-tabs';
import { QueueTable } from './queue-table';
import { PageHeader } from '@/components/ui/page-header';

/** The queue: status tabs, filters, the table and its pages, all read from and kept in the URL. */
export function ClaimsQueue({ user }: { user: CurrentUser }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = parseQueueSearch(searchParams);
  const { data } = useClaims(query);
  const navigation = useNavigation();
  const [pickedNames, setPickedNames] = useState<Record<string, string>>({});
  const mayFile = hasClaimRole(user.role, 'contribute');
  const busy =
    navigation.state === 'loading' && navigation.location.pathname === paths.app.queue.path;

  const show = (next: ClaimQueueQuery) => setSearchParams(queueSearchParams(next));
  const change = (changes: Partial<ClaimQueueQuery>) => show(withFilters(query, changes));
  const claimantName = query.claimant
    ? (pickedNames[query.claimant] ??
      data.items.find((item) => item.claimant.id === query.claimant)?.claimant.name)
    : undefined;

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title="Claims"
        purpose="Every claim on the desk and where it stands in its life, from filed to published. Filter it, sort it by a column, and share the address of any view."
        action={
          mayFile ? (
            <Button asChild highContrast>
              <RouterLink to={paths.app.fileClaim.getHref()}>
                <PlusIcon aria-hidden />
                File a claim
              </RouterLink>
            </Button>
          ) : null
        }
      />
      <QueueStatusTabs query={query} counts={data.counts} />
      <QueueFilters
        key={queueSearchParams({
          ...query,
          sort: undefined,
          order: undefined,
          page: undefined,
        }).toString()}
        query={query}
        role={user.role}
        claimantName={claimantName}
        onApply={(filters) => show(withFilters(query, filters))}
        onClaimantPicked={(claimant) =>
          setPickedNames((names) => ({ ...names, [claimant.id]: claimant.name }))
        }
      />
      <div aria-busy={busy} className={busy ? 'sl-busy' : undefined}>
        {data.total === 0 ? (
          <QueueEmpty filtered={isFiltered(query)} mayFile={mayFile} />
        ) : (
          <QueueTable items={data.items} total={data.total} query={query} onChange={change} />
        )}
      </div>
    </Flex>
  );
}
