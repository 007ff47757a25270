import { Card, Flex, Text } from '@radix-ui/themes';
import { DateTime } from '@/components/ui/date-time';
import { hasClaimRole } from '../../../claim-permissions';
import type { SectionProps } from '../claim-tabs';
import { SectionHeader } from '../section-header';
import { CommentForm } from './comment-form';

/** The desk's conversation about the claim, oldest first. */
export function CommentsSection({ claim, user, onNotice }: SectionProps) {
  return (
    <Flex direction="column" gap="4">
      <SectionHeader title="Comments" />
      {claim.comments.length === 0 ? (
        <Text color="gray">No comments yet.</Text>
      ) : (
        <ul className="sl-card-list" aria-label="Comments">
          {claim.comments.map((comment) => (
            <li key={comment.id}>
              <Card size="2">
                <Flex direction="column" gap="1">
                  <Text size="2">
                    <Text weight="bold">{comment.author.displayName}</Text>,{' '}
                    <DateTime value={comment.createdAt} />
                    {comment.editedAt ? ' (edited)' : ''}
                  </Text>
                  <Text as="p" className="sl-pre-line">
                    {comment.body}
                  </Text>
                </Flex>
              </Card>
            </li>
          ))}
        </ul>
      )}
      {hasClaimRole(user.role, 'comment') ? (
        <CommentForm claimId={claim.id} onNotice={onNotice} />
      ) : null}
    </Flex>
  );
}
