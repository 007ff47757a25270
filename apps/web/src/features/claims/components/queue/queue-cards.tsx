import { Card, Flex, Text } from '@radix-ui/themes';
import {
  claimantKindLabels,
  type ClaimListItem,
  type ClaimQueueQuery,
  type ClaimSortField,
} from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import { SortSelect, type SortChoice } from '@/components/ui/sort-select';
import { paths } from '@/config/paths';
import { queueDefaults } from '../../api/queue-search';
import { ClaimStatusBadge, LegalReviewBadge } from '../claim-status-badge';

const sortChoices: SortChoice<ClaimSortField>[] = [
  { field: 'filedAt', order: 'desc', label: 'Filed, newest first' },
  { field: 'filedAt', order: 'asc', label: 'Filed, oldest first' },
  { field: 'updatedAt', order: 'desc', label: 'Last change, newest first' },
  { field: 'updatedAt', order: 'asc', label: 'Last change, oldest first' },
  { field: 'status', order: 'asc', label: 'Status, from filed to set aside' },
  { field: 'status', order: 'desc', label: 'Status, from set aside to filed' },
  { field: 'summary', order: 'asc', label: 'Claim, A to Z' },
  { field: 'summary', order: 'desc', label: 'Claim, Z to A' },
];

interface QueueCardsProps {
  items: readonly ClaimListItem[];
  query: ClaimQueueQuery;
  onChange: (changes: Partial<ClaimQueueQuery>) => void;
}

/** The queue on a phone: each claim as a card with the table's facts, and its sort as a choice. */
export function QueueCards({ items, query, onChange }: QueueCardsProps) {
  return (
    <Flex direction="column" gap="3">
      <SortSelect
        choices={sortChoices}
        sort={query.sort ?? queueDefaults.sort}
        order={query.order ?? queueDefaults.order}
        onSort={(sort, order) => onChange({ sort, order, page: 1 })}
      />
      <ul className="sl-card-list" aria-label="Claims in the queue">
        {items.map((claim) => (
          <li key={claim.id}>
            <Card size="2">
              <Flex direction="column" gap="2" align="start">
                <Flex gap="2" align="center" wrap="wrap">
                  <ClaimStatusBadge status={claim.status} />
                  <LegalReviewBadge flagged={claim.legalReview} />
                </Flex>
                <AppLink to={paths.app.claim.getHref(claim.id)} weight="bold" className="sl-break">
                  {claim.summary}
                </AppLink>
                <Text size="2">
                  {claim.claimant.name}{' '}
                  <Text color="gray">
                    ({claimantKindLabels[claim.claimant.kind].toLowerCase()})
                  </Text>
                </Text>
                <Text size="1" color="gray">
                  Filed <DateTime value={claim.filedAt} show="date" /> by{' '}
                  {claim.filedBy.displayName}; researched by{' '}
                  {claim.assignee?.displayName ?? 'nobody yet'}.
                  {claim.topics.length ? ` Topics: ${claim.topics.join(', ')}.` : ''}
                </Text>
              </Flex>
            </Card>
          </li>
        ))}
      </ul>
    </Flex>
  );
}
