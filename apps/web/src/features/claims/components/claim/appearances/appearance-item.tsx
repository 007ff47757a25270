import { Badge, Button, Card, Flex, Link, Text } from '@radix-ui/themes';
import type { AppearanceView, ClaimDetail, CurrentUser } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import type { ShowNotice } from '@/components/ui/toaster';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useDeskTimeZone } from '@/lib/desk-time-zone';
import { useUpdateAppearance } from '../../../api/update-appearance';
import { hasClaimRole, mayChangePart } from '../../../claim-permissions';
import { OpenFileButton } from '../files/open-file-button';
import { staleClaimMessage } from '../claim-messages';
import { AttachCaptureDialog } from './attach-capture-dialog';

interface AppearanceItemProps {
  claim: ClaimDetail;
  appearance: AppearanceView;
  user: CurrentUser;
  onNotice: ShowNotice;
}

export function AppearanceItem({ claim, appearance, user, onNotice }: AppearanceItemProps) {
  const update = useUpdateAppearance(claim.id);
  const deskTimeZone = useDeskTimeZone();
  const mayChange =
    hasClaimRole(user.role, 'contribute') && mayChangePart(user, appearance.addedBy);
  const capture = claim.attachments.find((file) => file.id === appearance.captureAttachmentId);

  const markFirst = () =>
    update.mutate(
      { appearanceId: appearance.id, isFirstKnown: true, version: appearance.version },
      {
        onSuccess: () =>
          onNotice({
            tone: 'success',
            text: `${appearance.outlet} is now the first known appearance.`,
          }),
        onError: (error) =>
          onNotice({ tone: 'problem', text: changeErrorMessage(error, staleClaimMessage) }),
      },
    );

  return (
    <Card size="2">
      <Flex direction="column" gap="2">
        <Flex gap="2" align="center" wrap="wrap">
          <Text weight="bold">{appearance.outlet}</Text>
          {appearance.isFirstKnown ? (
            <Badge color="jade" variant="soft" highContrast>
              First known
            </Badge>
          ) : null}
        </Flex>
        <Link
          href={appearance.url}
          target="_blank"
          rel="nofollow noopener noreferrer"
          className="sl-break"
        >
          {appearance.url}
        </Link>
        <Text size="2">
          Seen <DateTime value={appearance.seenAt} timeZone={appearance.seenTimeZone} /> (
          {appearance.seenTimeZone.replaceAll('_', ' ')})
          {appearance.seenTimeZone === deskTimeZone ? (
            '.'
          ) : (
            <>
              ; on the desk&apos;s clock <DateTime value={appearance.seenAt} />.
            </>
          )}
        </Text>
        <Text size="1" color="gray">
          Added by {appearance.addedBy.displayName}
        </Text>
        <Flex gap="3" align="center" wrap="wrap">
          {capture ? (
            <OpenFileButton
              attachment={capture}
              label={`Download the capture (${capture.originalName})`}
            />
          ) : (
            <Text size="2" color="gray">
              No capture yet
            </Text>
          )}
          {mayChange && !capture ? (
            <AttachCaptureDialog claimId={claim.id} appearance={appearance} onNotice={onNotice} />
          ) : null}
          {mayChange && !appearance.isFirstKnown ? (
            <Button
              size="1"
              variant="soft"
              color="gray"
              highContrast
              loading={update.isPending}
              onClick={markFirst}
            >
              Mark as first known
            </Button>
          ) : null}
        </Flex>
      </Flex>
    </Card>
  );
}
