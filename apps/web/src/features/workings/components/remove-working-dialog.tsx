import { TrashIcon } from '@radix-ui/react-icons';
import { AlertDialog, Button, Flex, Text } from '@radix-ui/themes';
import type { WorkingView } from '@skyledger/contracts';
import { useState } from 'react';
import type { ShowNotice } from '@/components/ui/live-notice';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useRemoveWorking } from '../api/remove-working';
import { staleWorkingMessage } from './working-messages';

interface RemoveWorkingDialogProps {
  claimId: string;
  working: WorkingView;
  title: string;
  onNotice: ShowNotice;
}

/** Takes a working off the claim after a confirmation; the claim's history keeps the record. */
export function RemoveWorkingDialog({
  claimId,
  working,
  title,
  onNotice,
}: RemoveWorkingDialogProps) {
  const [open, setOpen] = useState(false);
  const remove = useRemoveWorking(claimId);
  return (
    <AlertDialog.Root
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) remove.reset();
      }}
    >
      <AlertDialog.Trigger>
        <Button size="1" variant="soft" color="red" highContrast>
          <TrashIcon aria-hidden />
          Remove
        </Button>
      </AlertDialog.Trigger>
      <AlertDialog.Content maxWidth="460px">
        <AlertDialog.Title>Remove this working?</AlertDialog.Title>
        <AlertDialog.Description size="2">
          “{title}” and its note leave the claim. The claim&apos;s history keeps a record that it
          was there and who removed it.
        </AlertDialog.Description>
        {remove.isError ? (
          <Text as="p" size="2" color="red" role="alert" mt="3">
            {changeErrorMessage(remove.error, staleWorkingMessage)}
          </Text>
        ) : null}
        <Flex gap="3" mt="4" justify="end" wrap="wrap">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray" highContrast disabled={remove.isPending}>
              Cancel
            </Button>
          </AlertDialog.Cancel>
          <Button
            color="red"
            highContrast
            loading={remove.isPending}
            onClick={() =>
              remove.mutate(working.id, {
                onSuccess: () => {
                  setOpen(false);
                  onNotice({ tone: 'success', text: `The working “${title}” is removed.` });
                },
              })
            }
          >
            Remove the working
          </Button>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
