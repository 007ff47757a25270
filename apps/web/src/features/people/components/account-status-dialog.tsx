import { AlertDialog, Button, Flex } from '@radix-ui/themes';
import type { UserListItem } from '@skyledger/contracts';
import { useState } from 'react';
import { useUpdateUser } from '../api/update-user';
import { describeUserChangeError, type ShowNotice } from './people-notice';

interface AccountStatusDialogProps {
  user: UserListItem;
  onNotice: ShowNotice;
}

/** Disable an active account or re-enable a disabled one, after a confirmation. */
export function AccountStatusDialog({ user, onNotice }: AccountStatusDialogProps) {
  const [open, setOpen] = useState(false);
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

  const confirm = () =>
    updateUser.mutate(
      { id: user.id, status: disabling ? 'disabled' : 'active', version: user.version },
      {
        onSuccess: () => onNotice({ tone: 'success', text: copy.done }),
        onError: (error) => onNotice({ tone: 'problem', text: describeUserChangeError(error) }),
        onSettled: () => setOpen(false),
      },
    );

  return (
    <AlertDialog.Root open={open} onOpenChange={setOpen}>
      <AlertDialog.Trigger>
        <Button
          variant="soft"
          color={disabling ? 'red' : 'gray'}
          highContrast
          size="1"
          aria-label={`${copy.trigger} ${user.displayName}`}
        >
          {copy.trigger}
        </Button>
      </AlertDialog.Trigger>
      <AlertDialog.Content maxWidth="460px">
        <AlertDialog.Title>{copy.title}</AlertDialog.Title>
        <AlertDialog.Description size="2">{copy.description}</AlertDialog.Description>
        <Flex gap="3" mt="4" justify="end" wrap="wrap">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray" highContrast disabled={updateUser.isPending}>
              Cancel
            </Button>
          </AlertDialog.Cancel>
          <Button
            color={disabling ? 'red' : undefined}
            highContrast
            loading={updateUser.isPending}
            onClick={confirm}
          >
            {copy.confirm}
          </Button>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
