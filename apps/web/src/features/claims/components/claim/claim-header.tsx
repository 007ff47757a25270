import { Badge, Flex, Text } from '@radix-ui/themes';
import { claimantKindLabels, setAsideReasonLabels, type ClaimDetail } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { PageHeader } from '@/components/ui/page-header';
import { ClaimStatusBadge, LegalReviewBadge } from '../claim-status-badge';

/** The claim's one line, its status and flags, who made it and who filed it when. */
export function ClaimHeader({ claim }: { claim: ClaimDetail }) {
  return (
    <PageHeader
      above={
        <Flex gap="2" align="center" wrap="wrap">
          <ClaimStatusBadge status={claim.status} />
          <LegalReviewBadge flagged={claim.legalReview} />
          {claim.topics.map((topic) => (
            <Badge key={topic} color="gray" variant="outline" highContrast>
              {topic}
            </Badge>
          ))}
        </Flex>
      }
      title={claim.summary}
      purpose="Everything the desk holds on this claim: where it was seen, its sources and workings, the right of reply, its verdict and publication, and every change on record."
      below={
        <>
          <Text color="gray" size="2">
            Made by <Text weight="bold">{claim.claimant.name}</Text> (
            {claimantKindLabels[claim.claimant.kind].toLowerCase()}). Filed by{' '}
            {claim.filedBy.displayName} on <DateTime value={claim.filedAt} />; last changed{' '}
            <DateTime value={claim.updatedAt} />.
          </Text>
          {claim.status === 'set_aside' && claim.setAsideReason ? (
            <Text size="2">
              Set aside: {setAsideReasonLabels[claim.setAsideReason]}
              {claim.setAsideNote ? ` — ${claim.setAsideNote}` : ''}
            </Text>
          ) : null}
        </>
      }
    />
  );
}
