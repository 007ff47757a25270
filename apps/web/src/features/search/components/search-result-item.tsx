import { Badge, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { SearchDocumentType, SearchHit } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import { paths } from '@/config/paths';
import { ClaimStatusBadge } from '@/features/claims/components/claim-status-badge';
import { HighlightedText } from './highlighted-text';

const typeWords: Record<SearchDocumentType, { label: string; dated: string }> = {
  claim: { label: 'Claim', dated: 'Filed' },
  source: { label: 'Source', dated: 'Added' },
  explainer: { label: 'Explainer', dated: 'Published' },
};

/**
 * One thing found. Claims link to their page; sources and explainers have no page of their
 * own on the desk yet, and the search does not say which claims cite a source.
 */
export function SearchResultItem({ hit }: { hit: SearchHit }) {
  const words = typeWords[hit.type];
  const title = <HighlightedText runs={hit.title} />;
  return (
    <Card size="2">
      <Flex direction="column" gap="2">
        <Flex gap="2" align="center" wrap="wrap">
          <Badge color="gray" variant="surface" highContrast>
            {words.label}
          </Badge>
          {hit.status ? <ClaimStatusBadge status={hit.status} /> : null}
          <Text size="1" color="gray">
            {words.dated} <DateTime value={hit.date} show="date" />
          </Text>
        </Flex>
        <Heading as="h3" size="3" className="sl-break">
          {hit.type === 'claim' ? (
            <AppLink to={paths.app.claim.getHref(hit.id)}>{title}</AppLink>
          ) : (
            title
          )}
        </Heading>
        {hit.snippet ? (
          <Text as="p" size="2" className="sl-break sl-pre-line">
            <HighlightedText runs={hit.snippet} />
          </Text>
        ) : null}
        {hit.topics.length ? (
          <Flex gap="1" wrap="wrap">
            {hit.topics.map((topic) => (
              <Badge key={topic} color="gray" variant="outline" highContrast>
                {topic}
              </Badge>
            ))}
          </Flex>
        ) : null}
      </Flex>
    </Card>
  );
}
