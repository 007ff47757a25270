import { Badge, Card, Flex, Link, Text } from '@radix-ui/themes';
import { sourceKindLabels, type ClaimSourceView, type CurrentUser } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import type { ShowNotice } from '@/components/ui/toaster';
import { hasClaimRole, mayChangePart } from '../../../claim-permissions';
import { GradeBadge } from './grade-badge';
import { RegradeDialog } from './regrade-dialog';

interface SourceItemProps {
  claimId: string;
  source: ClaimSourceView;
  user: CurrentUser;
  onNotice: ShowNotice;
}

function citation(source: ClaimSourceView): string {
  return [source.authors, source.publisher, source.year?.toString()].filter(Boolean).join(' · ');
}

export function SourceItem({ claimId, source, user, onNotice }: SourceItemProps) {
  const mayRegrade = hasClaimRole(user.role, 'contribute') && mayChangePart(user, source.addedBy);
  const cited = citation(source);
  return (
    <Card size="2">
      <Flex direction="column" gap="2">
        <Text weight="bold">{source.title}</Text>
        {cited ? <Text size="2">{cited}</Text> : null}
        <Flex gap="2" wrap="wrap" align="center">
          <Badge color="gray" variant="outline" highContrast>
            {sourceKindLabels[source.kind]}
          </Badge>
          <GradeBadge grade={source.grade} />
        </Flex>
        <Text size="2">
          <Text weight="bold">Why this grade:</Text> {source.gradeReason}
        </Text>
        {source.doi ? (
          <Link
            href={`https://doi.org/${source.doi}`}
            target="_blank"
            rel="noopener noreferrer"
            size="2"
          >
            doi:{source.doi}
          </Link>
        ) : null}
        {source.url ? (
          <Link
            href={source.url}
            target="_blank"
            rel="noopener noreferrer"
            size="2"
            className="sl-break"
          >
            {source.url}
          </Link>
        ) : null}
        <Text size="1" color="gray">
          {source.accessedOn ? (
            <>
              Accessed <DateTime value={source.accessedOn} calendar />.{' '}
            </>
          ) : null}
          Cited here by {source.linkedBy.displayName},{' '}
          <DateTime value={source.linkedAt} show="date" />.
        </Text>
        {mayRegrade ? (
          <Flex>
            <RegradeDialog claimId={claimId} source={source} onNotice={onNotice} />
          </Flex>
        ) : null}
      </Flex>
    </Card>
  );
}
