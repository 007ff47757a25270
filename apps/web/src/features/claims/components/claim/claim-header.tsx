import { Badge, Flex, Heading, Text } from '@radix-ui/themes';
import { claimantKindLabels, setAsideReasonLabels, type ClaimDetail } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { ClaimStatusBadge } from '../claim-status-badge';

/** The claim's one line, its status and flags, who made it and who filed it when. */
export function ClaimHeader({ claim }: { claim: ClaimDetail }) {
  return (
    <Flex direction="column" gap="2">
      <Flex gap="2" align="center" wrap="wrap">
        <ClaimStatusBadge status={claim.status} />
        {claim.legalReview ? (
          <Badge color="red" variant="soft" highContrast>
            Legal review
          </Badge>
        ) : null}
        {claim.topics.map((topic) => (
          <Badge key={topic} color="gray" variant="outline" highContrast>
            {topic}
          </Badge>
        ))}
      </Flex>
      <Heading as="h1" size={{ initial: '6', sm: '7' }}>
        {claim.summary}
      </Heading>
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
    </Flex>
  );
}
