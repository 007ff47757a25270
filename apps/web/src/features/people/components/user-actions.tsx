import { Flex } from '@radix-ui/themes';
import type { UserListItem } from '@skyledger/contracts';
import { AccountStatusDialog } from './account-status-dialog';
import type { ShowNotice } from './people-notice';
import { ResendInvitationButton } from './resend-invitation-button';

interface UserActionsProps {
  user: UserListItem;
  isCurrentUser: boolean;
  onNotice: ShowNotice;
}

/** What the desk chief can do to an account: resend an invitation, or disable and re-enable. */
export function UserActions({ user, isCurrentUser, onNotice }: UserActionsProps) {
  if (user.status === 'invited') {
    return (
      <Flex>
        <ResendInvitationButton user={user} onNotice={onNotice} />
      </Flex>
    );
  }
  // Another desk chief disables your own account, so nobody locks themself out.
  if (isCurrentUser) return null;
  return (
    <Flex>
      <AccountStatusDialog user={user} onNotice={onNotice} />
    </Flex>
  );
}
