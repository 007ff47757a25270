import { Badge, Flex, Heading, Text } from '@radix-ui/themes';
import type { ClaimVerdictView, VerdictVersionView } from '@skyledger/contracts';
import { explainerPlainText } from '@skyledger/explainer';
import { DateTime } from '@/components/ui/date-time';
import { verdictStateColors, verdictStateLabels } from '../verdict-words';
import { RatingWords } from './rating-words';

function VersionEntry({
  version,
  conflicts,
}: {
  version: VerdictVersionView;
  conflicts: ClaimVerdictView['conflicts'];
}) {
  return (
    <li>
      <Flex direction="column" gap="2">
        <Flex gap="2" align="center" wrap="wrap">
          <Text weight="bold">Version {version.number}</Text>
          <Badge color={verdictStateColors[version.state]} variant="soft" highContrast>
            {verdictStateLabels[version.state]}
          </Badge>
        </Flex>
        <Text size="2" color="gray">
          Drafted by {version.draftedBy.displayName}, <DateTime value={version.createdAt} />; last
          edited by {version.lastEditedBy.displayName}, <DateTime value={version.updatedAt} />
          {version.submittedAt ? (
            <>
              ; submitted <DateTime value={version.submittedAt} />
            </>
          ) : null}
          .
        </Text>
        <RatingWords ratingId={version.ratingId} compact />
        {version.bottomLine ? <Text size="2">{version.bottomLine}</Text> : null}
        {version.decisions.map((decision) => (
          <Flex key={decision.id} direction="column" gap="1" className="sl-decision">
            <Text size="2" weight="bold">
              {decision.decision === 'cleared' ? 'Cleared' : 'Sent back'} by{' '}
              {decision.by.displayName}, <DateTime value={decision.at} />
            </Text>
            {decision.notes ? (
              <blockquote className="sl-quote">
                <Text size="2">{decision.notes}</Text>
              </blockquote>
            ) : null}
          </Flex>
        ))}
        {conflicts.map((conflict) => (
          <details key={conflict.id}>
            <Text asChild size="2" weight="medium">
              <summary className="sl-details-summary">
                A save by {conflict.savedBy.displayName} crossed another on{' '}
                <DateTime value={conflict.at} />: its words are kept here
              </summary>
            </Text>
            <Flex direction="column" gap="1" mt="2">
              {conflict.bottomLine ? <Text size="2">{conflict.bottomLine}</Text> : null}
              {conflict.body ? (
                <Text as="p" size="2" className="sl-pre-line sl-break">
                  {explainerPlainText(conflict.body)}
                </Text>
              ) : null}
            </Flex>
          </details>
        ))}
      </Flex>
    </li>
  );
}

/** Every version of the verdict, newest first, each with the sign-off decisions on it. */
export function VersionHistory({ verdict }: { verdict: ClaimVerdictView }) {
  if (verdict.versions.length === 0) return null;
  return (
    <Flex asChild direction="column" gap="3">
      <section aria-labelledby="version-history-title">
        <Heading as="h2" size="5" id="version-history-title">
          Version history
        </Heading>
        <ol className="sl-history" aria-label="Versions of the verdict, newest first">
          {verdict.versions.map((version) => (
            <VersionEntry
              key={version.id}
              version={version}
              conflicts={verdict.conflicts.filter((conflict) => conflict.versionId === version.id)}
            />
          ))}
        </ol>
      </section>
    </Flex>
  );
}
