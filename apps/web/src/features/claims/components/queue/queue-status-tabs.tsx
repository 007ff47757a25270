import { Badge, TabNav } from '@radix-ui/themes';
import {
  claimStatuses,
  claimStatusLabels,
  type ClaimQueueQuery,
  type ClaimStatus,
} from '@skyledger/contracts';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { queueSearchParams, withFilters } from '../../api/queue-search';

interface QueueStatusTabsProps {
  query: ClaimQueueQuery;
  /** Claims per status under the other filters, from the queue's answer. */
  counts: Record<ClaimStatus, number>;
}

/** One link per status with its count; each keeps the other filters, so views stay shareable. */
export function QueueStatusTabs({ query, counts }: QueueStatusTabsProps) {
  const all = claimStatuses.reduce((sum, status) => sum + counts[status], 0);
  const tabs: { status: ClaimStatus | undefined; label: string; count: number }[] = [
    { status: undefined, label: 'All', count: all },
    ...claimStatuses.map((status) => ({
      status,
      label: claimStatusLabels[status],
      count: counts[status],
    })),
  ];
  return (
    <TabNav.Root aria-label="Claims by status" className="sl-scroll-x">
      {tabs.map(({ status, label, count }) => (
        <TabNav.Link key={label} asChild active={query.status === status}>
          <RouterLink
            to={paths.app.queue.getHref(queueSearchParams(withFilters(query, { status })))}
          >
            {label}
            <Badge color="gray" variant="soft" highContrast radius="full" ml="1">
              {count}
            </Badge>
          </RouterLink>
        </TabNav.Link>
      ))}
    </TabNav.Root>
  );
}
