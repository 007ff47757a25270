import { Button } from '@radix-ui/themes';
import type { UserListItem } from '@skyledger/contracts';
import { errorMessage } from '@/lib/api-error-messages';
import { useResendInvitation } from '../api/resend-invitation';
import type { ShowNotice } from './people-notice';

export function ResendInvitationButton({
  user,
  onNotice,
}: {
  user: UserListItem;
  onNotice: ShowNotice;
}) {
  const resend = useResendInvitation();
  return (
    <Button
      variant="soft"
      color="gray"
      highContrast
      size="1"
      loading={resend.isPending}
      aria-label={`Resend the invitation to ${user.displayName}`}
      onClick={() =>
        resend.mutate(user.id, {
          onSuccess: () =>
            onNotice({
              tone: 'success',
              text: `A fresh invitation link went to ${user.email}. It works for 72 hours.`,
            }),
          onError: (error) => onNotice({ tone: 'problem', text: errorMessage(error) }),
        })
      }
    >
      Resend invite
    </Button>
  );
}
