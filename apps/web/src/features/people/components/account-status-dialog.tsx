import { Button } from '@radix-ui/themes';
import type { UserListItem } from '@skyledger/contracts';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { useUpdateUser } from '../api/update-user';
import { describeUserChangeError, type ShowNotice } from './people-notice';

interface AccountStatusDialogProps {
  user: UserListItem;
  onNotice: ShowNotice;
}

/** Disable an active account or re-enable a disabled one, after a confirmation. */
export function AccountStatusDialog({ user, onNotice }: AccountStatusDialogProps) {
  const updateUser = useUpdateUser();
  const disabling = user.status !== 'disabled';
  const copy = disabling
    ? {
        trigger: 'Disable',
        title: `Disable ${user.displayName}?`,
        description:
          'They will no longer be able to sign in. Everything they did stays on the record, and you can re-enable the account later.',
        confirm: 'Disable account',
        done: `${user.displayName} is disabled and can no longer sign in.`,
      }
    : {
        trigger: 'Re-enable',
        title: `Re-enable ${user.displayName}?`,
        description: 'They will be able to sign in again with their password.',
        confirm: 'Re-enable account',
        done: `${user.displayName} can sign in again.`,
      };

  return (
    <ConfirmDialog
      trigger={
        <Button
          variant="soft"
          color={disabling ? 'red' : 'gray'}
          highContrast
          size="1"
          aria-label={`${copy.trigger} ${user.displayName}`}
        >
          {copy.trigger}
        </Button>
      }
      title={copy.title}
      description={copy.description}
      keepLabel="Cancel"
      confirmLabel={copy.confirm}
      color={disabling ? 'red' : 'blue'}
      maxWidth="460px"
      describeError={describeUserChangeError}
      onConfirm={() =>
        updateUser
          .mutateAsync({
            id: user.id,
            status: disabling ? 'disabled' : 'active',
            version: user.version,
          })
          .then(() => onNotice({ tone: 'success', text: copy.done }))
      }
    />
  );
}
