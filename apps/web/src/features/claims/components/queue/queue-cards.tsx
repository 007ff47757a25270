import { Card, Flex, Text } from '@radix-ui/themes';
import {
  claimantKindLabels,
  type ClaimListItem,
  type ClaimQueueQuery,
  type ClaimSortField,
} from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import { SelectField } from '@/components/ui/select-field';
import { paths } from '@/config/paths';
import { queueDefaults } from '../../api/queue-search';
import { ClaimStatusBadge, LegalReviewBadge } from '../claim-status-badge';

type SortChoice = `${ClaimSortField} ${'asc' | 'desc'}`;

const sortChoices: { value: SortChoice; label: string }[] = [
  { value: 'filedAt desc', label: 'Filed, newest first' },
  { value: 'filedAt asc', label: 'Filed, oldest first' },
  { value: 'updatedAt desc', label: 'Last change, newest first' },
  { value: 'updatedAt asc', label: 'Last change, oldest first' },
  { value: 'status asc', label: 'Status, from filed to set aside' },
  { value: 'status desc', label: 'Status, from set aside to filed' },
  { value: 'summary asc', label: 'Claim, A to Z' },
  { value: 'summary desc', label: 'Claim, Z to A' },
];

interface QueueCardsProps {
  items: readonly ClaimListItem[];
  query: ClaimQueueQuery;
  onChange: (changes: Partial<ClaimQueueQuery>) => void;
}

/** The queue on a phone: each claim as a card with the table's facts, and its sort as a choice. */
export function QueueCards({ items, query, onChange }: QueueCardsProps) {
  const sort: SortChoice = `${query.sort ?? queueDefaults.sort} ${query.order ?? queueDefaults.order}`;
  return (
    <Flex direction="column" gap="3">
      <SelectField
        label="Sort by"
        value={sort}
        options={sortChoices}
        onValueChange={(choice) => {
          const [field, order] = choice.split(' ') as [ClaimSortField, 'asc' | 'desc'];
          onChange({ sort: field, order, page: 1 });
        }}
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
