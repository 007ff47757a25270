import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { ClaimDetail } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { paths } from '@/config/paths';
import { SourceSummary } from './source-summary';
import { WorkingSummary, type WorkingsOnHand } from './working-summary';

interface EvidencePanelProps extends WorkingsOnHand {
  claim: ClaimDetail;
}

/** Beside the verdict: the claim as it was said, its graded sources and its workings. */
export function EvidencePanel({ claim, workings, calculators }: EvidencePanelProps) {
  return (
    <Card size="2" asChild>
      <aside aria-labelledby="evidence-title">
        <Flex direction="column" gap="4">
          <Heading as="h2" size="4" id="evidence-title">
            The evidence
          </Heading>
          <Flex direction="column" gap="2">
            <Heading as="h3" size="2">
              The claim as said
            </Heading>
            <blockquote className="sl-quote">{claim.text}</blockquote>
            <Text size="2" color="gray">
              {claim.claimant.name}
            </Text>
          </Flex>
          <Flex direction="column" gap="2">
            <Heading as="h3" size="2">
              Sources ({claim.sources.length})
            </Heading>
            {claim.sources.length === 0 ? (
              <Text size="2" color="gray">
                None cited on the claim yet.
              </Text>
            ) : (
              <ul className="sl-card-list" aria-label="The claim’s sources">
                {claim.sources.map((source) => (
                  <li key={source.id}>
                    <Flex direction="column" gap="1">
                      <SourceSummary source={source} />
                      <Text size="1" color="gray">
                        {source.gradeReason}
                      </Text>
                    </Flex>
                  </li>
                ))}
              </ul>
            )}
          </Flex>
          <Flex direction="column" gap="2">
            <Heading as="h3" size="2">
              Workings ({workings?.length ?? '…'})
            </Heading>
            {workings?.length === 0 ? (
              <Text size="2" color="gray">
                No workings on the claim yet.
              </Text>
            ) : (
              <ul className="sl-card-list" aria-label="The claim’s workings">
                {(workings ?? []).map((working) => (
                  <li key={working.id}>
                    <WorkingSummary
                      workingId={working.id}
                      workings={workings}
                      calculators={calculators}
                    />
                  </li>
                ))}
              </ul>
            )}
          </Flex>
          <AppLink to={paths.app.claim.getHref(claim.id)} size="2">
            Open the claim page
          </AppLink>
        </Flex>
      </aside>
    </Card>
  );
}
