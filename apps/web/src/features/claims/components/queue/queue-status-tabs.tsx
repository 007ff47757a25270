import {
  claimStatuses,
  claimStatusLabels,
  type ClaimQueueQuery,
  type ClaimStatus,
} from '@skyledger/contracts';
import { CountTabNav } from '@/components/ui/count-tab-nav';
import { paths } from '@/config/paths';
import { queueSearchParams, withFilters } from '../../api/queue-search';

interface QueueStatusTabsProps {
  query: ClaimQueueQuery;
  /** Claims per status under the other filters, from the queue's answer. */
  counts: Record<ClaimStatus, number>;
}

/** One link per status with its count; each keeps the other filters, so views stay shareable. */
export function QueueStatusTabs({ query, counts }: QueueStatusTabsProps) {
  return (
    <CountTabNav
      label="Claims by status"
      keys={claimStatuses}
      names={claimStatusLabels}
      counts={counts}
      current={query.status}
      hrefOf={(status) =>
        paths.app.queue.getHref(queueSearchParams(withFilters(query, { status })))
      }
    />
  );
}
