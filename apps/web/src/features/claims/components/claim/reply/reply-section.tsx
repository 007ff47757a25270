import { Badge, Card, Flex, Text } from '@radix-ui/themes';
import { replyChannelLabels, replyOutcomeLabels } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { hasClaimRole } from '../../../claim-permissions';
import type { SectionProps } from '../claim-tabs';
import { SectionHeader } from '../section-header';
import { LogReplyAttemptDialog } from './log-reply-attempt-dialog';

/** Every attempt to reach the claimant for their side, and what came of it. */
export function ReplySection({ claim, user, onNotice }: SectionProps) {
  return (
    <Flex direction="column" gap="4">
      <SectionHeader
        title="Right of reply"
        action={
          hasClaimRole(user.role, 'research') ? (
            <LogReplyAttemptDialog
              claimId={claim.id}
              claimant={claim.claimant.name}
              onNotice={onNotice}
            />
          ) : null
        }
      />
      {claim.replyAttempts.length === 0 ? (
        <Text color="gray">
          Nobody has tried to reach {claim.claimant.name} yet. Sign-off waits until an attempt is
          logged.
        </Text>
      ) : (
        <ul className="sl-card-list" aria-label="Reply attempts">
          {claim.replyAttempts.map((attempt) => (
            <li key={attempt.id}>
              <Card size="2">
                <Flex direction="column" gap="2">
                  <Flex gap="2" align="center" wrap="wrap">
                    <Text weight="bold">{attempt.contacted}</Text>
                    <Badge color="gray" variant="soft" highContrast>
                      {replyOutcomeLabels[attempt.outcome]}
                    </Badge>
                  </Flex>
                  <Text size="2">
                    {replyChannelLabels[attempt.channel]}, <DateTime value={attempt.contactedAt} />
                    {attempt.deadline ? (
                      <>
                        ; deadline <DateTime value={attempt.deadline} />
                      </>
                    ) : null}
                    .
                  </Text>
                  {attempt.reply ? (
                    <blockquote className="sl-quote">{attempt.reply}</blockquote>
                  ) : null}
                  <Text size="1" color="gray">
                    Logged by {attempt.loggedBy.displayName}
                  </Text>
                </Flex>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </Flex>
  );
}
