import { Button, Dialog, Flex } from '@radix-ui/themes';
import type { FormEventHandler, ReactNode } from 'react';
import { FormError } from '@/components/ui/form-error';

interface FormDialogProps {
  /** The button that opens the dialog. */
  trigger: ReactNode;
  title: string;
  description?: string;
  open: boolean;
  onOpenChange: (open: boolean) => void;
  onSubmit: FormEventHandler<HTMLFormElement>;
  submitLabel: string;
  submitting: boolean;
  /** What the API said that belongs to no single field. */
  formError: string | undefined;
  maxWidth?: string;
  children: ReactNode;
}

/** A form in a Radix dialog: its title names the form, Cancel closes it, Escape too. */
export function FormDialog({
  trigger,
  title,
  description,
  open,
  onOpenChange,
  onSubmit,
  submitLabel,
  submitting,
  formError,
  maxWidth = '560px',
  children,
}: FormDialogProps) {
  return (
    <Dialog.Root open={open} onOpenChange={onOpenChange}>
      <Dialog.Trigger>{trigger}</Dialog.Trigger>
      <Dialog.Content
        maxWidth={maxWidth}
        {...(description ? {} : { 'aria-describedby': undefined })}
      >
        <Dialog.Title>{title}</Dialog.Title>
        {description ? (
          <Dialog.Description size="2" mb="4">
            {description}
          </Dialog.Description>
        ) : null}
        <form onSubmit={onSubmit} noValidate aria-label={title}>
          <Flex direction="column" gap="4">
            <FormError message={formError} />
            {children}
            <Flex gap="3" justify="end" mt="2" wrap="wrap">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray" highContrast>
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" highContrast loading={submitting}>
                {submitLabel}
              </Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
