import { ExternalLinkIcon } from '@radix-ui/react-icons';
import {
  Button,
  Callout,
  Flex,
  Heading,
  Link,
  Skeleton,
  Text,
  VisuallyHidden,
} from '@radix-ui/themes';
import type { ClaimDetail, CurrentUser, PublicationView } from '@skyledger/contracts';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import type { ShowNotice } from '@/components/ui/toaster';
import { useTransitionClaim } from '@/features/claims/api/transition-claim';
import { refusalMessage } from '@/features/verdicts/verdict-words';
import { errorMessage } from '@/lib/api-error-messages';
import { useCancelSchedule } from '../api/cancel-schedule';
import { usePublications } from '../api/get-publications';
import { mayPublish, mayStartCorrection } from '../publishing-permissions';
import { inItsZone, readerPageUrl } from '../publishing-words';
import { PublicationsList } from './publications-list';
import { PublishDialog } from './publish-dialog';

interface PublishingSectionProps {
  claim: ClaimDetail;
  user: CurrentUser;
  onNotice: ShowNotice;
}

/** Where the claim stands with readers, in words, for whoever opens the tab. */
function standing(claim: ClaimDetail, publishedBefore: boolean, scheduled: boolean): string {
  switch (claim.status) {
    case 'cleared':
      if (scheduled)
        return 'Cleared and scheduled. Readers see nothing of this version before its time.';
      return publishedBefore
        ? 'The corrected version is cleared. It goes out with an update note saying what changed.'
        : 'Cleared: ready to publish. The copy desk or the desk chief publishes it, now or at a set time.';
    case 'published':
      return 'Published: readers can read the explainer, and every earlier publication stays readable at its own address.';
    case 'set_aside':
      return 'Set aside: nothing more is published from this claim.';
    default:
      return publishedBefore
        ? 'A correction is under way. Readers still see the explainer as last published until the corrected version is cleared and published.'
        : 'Not cleared yet. Once the copy desk clears a verdict version, it is published from here.';
  }
}

function ScheduledCallout({
  claim,
  scheduled,
  mayCancel,
  onNotice,
}: {
  claim: ClaimDetail;
  scheduled: PublicationView;
  mayCancel: boolean;
  onNotice: ShowNotice;
}) {
  const cancel = useCancelSchedule(claim.id);
  const when = inItsZone(scheduled.scheduledFor ?? '', scheduled.scheduledTimeZone ?? 'UTC');
  return (
    <Callout.Root color="amber" highContrast size="2">
      <Callout.Text>
        Scheduled to publish on <time dateTime={scheduled.scheduledFor ?? ''}>{when}</time>.
      </Callout.Text>
      {mayCancel ? (
        <Flex mt="2">
          <ConfirmDialog
            describeError={refusalMessage}
            trigger={
              <Button variant="soft" color="red" highContrast>
                Cancel the schedule
              </Button>
            }
            title="Cancel the scheduled publication?"
            description={`It will not be published on ${when}. The claim stays cleared, so it can be published or scheduled again.`}
            keepLabel="Keep the schedule"
            confirmLabel="Cancel the schedule"
            color="red"
            onConfirm={() =>
              cancel.mutateAsync(claim.version).then(() =>
                onNotice({
                  tone: 'success',
                  text: 'The schedule is cancelled: nothing will be published on its own.',
                }),
              )
            }
          />
        </Flex>
      ) : null}
    </Callout.Root>
  );
}

function StartCorrection({ claim, onNotice }: { claim: ClaimDetail; onNotice: ShowNotice }) {
  const transition = useTransitionClaim(claim.id);
  return (
    <Flex direction="column" gap="2" align="start">
      <Text size="2" color="gray">
        Found something to put right? Start a correction: the claim goes back into research for a
        new verdict version. The public page stays as published until the corrected version is
        cleared and published with an update note.
      </Text>
      <ConfirmDialog
        describeError={refusalMessage}
        trigger={<Button highContrast>Start a correction</Button>}
        title="Start a correction?"
        description="The claim goes back into research, where a new verdict version is drafted, signed off and published with a dated update note. Until then readers keep seeing the explainer as it was published."
        keepLabel="Not now"
        confirmLabel="Start the correction"
        color="blue"
        onConfirm={() =>
          transition.mutateAsync({ to: 'in_research', version: claim.version }).then(() =>
            onNotice({
              tone: 'success',
              text: 'The claim is back in research for a correction. The public page is unchanged until the new version is published.',
            }),
          )
        }
      />
    </Flex>
  );
}

/**
 * The claim's publishing: publish or schedule a cleared version (copy desk, desk chief),
 * cancel a schedule, reopen a published claim for a correction (science editor, desk
 * chief), and every publication with its note and reader address.
 */
export function PublishingSection({ claim, user, onNotice }: PublishingSectionProps) {
  const publications = usePublications(claim.id);
  const heading = (
    <Heading as="h2" size="5">
      Publishing
    </Heading>
  );
  if (publications.isPending) {
    return (
      <Flex direction="column" gap="4">
        {heading}
        <Skeleton height="120px">Loading the publications…</Skeleton>
      </Flex>
    );
  }
  if (publications.isError) {
    return (
      <Flex direction="column" gap="4">
        {heading}
        <Text color="red">The publications could not load: {errorMessage(publications.error)}</Text>
      </Flex>
    );
  }
  const list = publications.data;
  const scheduled = list.find((publication) => publication.state === 'scheduled');
  const publishedBefore = list.some((publication) => publication.state === 'published');
  const readerUrl = readerPageUrl(list);
  const publishing = mayPublish(user, claim);

  return (
    <Flex direction="column" gap="4">
      <Flex justify="between" align="center" gap="3" wrap="wrap">
        {heading}
        {readerUrl ? (
          <Link href={readerUrl} target="_blank" rel="noopener noreferrer" highContrast>
            View as readers see it
            <VisuallyHidden> (opens in a new tab)</VisuallyHidden>{' '}
            <ExternalLinkIcon aria-hidden className="sl-inline-icon" />
          </Link>
        ) : null}
      </Flex>
      <Text as="p">{standing(claim, publishedBefore, scheduled !== undefined)}</Text>
      {scheduled && claim.status === 'cleared' ? (
        <ScheduledCallout
          claim={claim}
          scheduled={scheduled}
          mayCancel={publishing}
          onNotice={onNotice}
        />
      ) : null}
      {publishing && !scheduled ? (
        <Flex gap="3" wrap="wrap">
          <PublishDialog
            claim={claim}
            scheduled={false}
            needsNote={publishedBefore}
            onNotice={onNotice}
          />
          <PublishDialog claim={claim} scheduled needsNote={publishedBefore} onNotice={onNotice} />
        </Flex>
      ) : null}
      {mayStartCorrection(user, claim) ? (
        <StartCorrection claim={claim} onNotice={onNotice} />
      ) : null}
      <Heading as="h3" size="4">
        Publications
      </Heading>
      <PublicationsList publications={list} />
    </Flex>
  );
}
