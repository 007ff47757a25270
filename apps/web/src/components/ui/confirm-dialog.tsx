import { AlertDialog, Button, Flex } from '@radix-ui/themes';
import { useState, type ReactNode } from 'react';
import { errorMessage } from '@/lib/api-error-messages';
import { FormError } from './form-error';

interface ConfirmDialogProps {
  /** The button that opens the dialog. */
  trigger: ReactNode;
  title: string;
  description: ReactNode;
  confirmLabel: string;
  keepLabel: string;
  color: 'red' | 'blue';
  /** Runs the change; the dialog closes when it succeeds and shows the API's refusal if not. */
  onConfirm: () => Promise<unknown>;
  /** Words for a refusal; the API's own message by default. */
  describeError?: (error: unknown) => string;
  maxWidth?: string;
}

/**
 * Asks before anything destructive or that readers would feel, and says why it was refused.
 * The desk's one confirmation.
 */
export function ConfirmDialog({
  trigger,
  title,
  description,
  confirmLabel,
  keepLabel,
  color,
  onConfirm,
  describeError = errorMessage,
  maxWidth = '520px',
}: ConfirmDialogProps) {
  const [open, setOpen] = useState(false);
  const [pending, setPending] = useState(false);
  const [refusal, setRefusal] = useState<string>();
  const confirm = () => {
    setPending(true);
    setRefusal(undefined);
    onConfirm()
      .then(
        () => setOpen(false),
        (error: unknown) => setRefusal(describeError(error)),
      )
      .finally(() => setPending(false));
  };
  return (
    <AlertDialog.Root
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) setRefusal(undefined);
      }}
    >
      <AlertDialog.Trigger>{trigger}</AlertDialog.Trigger>
      <AlertDialog.Content maxWidth={maxWidth}>
        <AlertDialog.Title>{title}</AlertDialog.Title>
        <AlertDialog.Description size="2">{description}</AlertDialog.Description>
        <Flex direction="column" gap="3" mt="4">
          <FormError message={refusal} />
          <Flex gap="3" justify="end" wrap="wrap">
            <AlertDialog.Cancel>
              <Button variant="soft" color="gray" highContrast disabled={pending}>
                {keepLabel}
              </Button>
            </AlertDialog.Cancel>
            <Button color={color} highContrast loading={pending} onClick={confirm}>
              {confirmLabel}
            </Button>
          </Flex>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
