import { zodResolver } from '@hookform/resolvers/zod';
import { PlusIcon } from '@radix-ui/react-icons';
import { Button, Dialog, Flex } from '@radix-ui/themes';
import { inviteUserSchema, roleLabels, roles, type InviteUserRequest } from '@skyledger/contracts';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { FormError } from '@/components/ui/form-error';
import { SelectField } from '@/components/ui/select-field';
import { TextInputField } from '@/components/ui/text-input-field';
import { roleDuties } from '@/config/role-duties';
import { applyApiError } from '@/lib/form-errors';
import { useInviteUser } from '../api/invite-user';
import type { ShowNotice } from './people-notice';

const roleOptions = roles.map((role) => ({ value: role, label: roleLabels[role] }));
const emptyInvitation: InviteUserRequest = { displayName: '', email: '', role: 'reporter' };

export function InviteUserDialog({ onNotice }: { onNotice: ShowNotice }) {
  const [open, setOpen] = useState(false);
  const inviteUser = useInviteUser();
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<InviteUserRequest>({
    resolver: zodResolver(inviteUserSchema),
    defaultValues: emptyInvitation,
  });

  const onSubmit = handleSubmit((values) =>
    inviteUser.mutateAsync(values).then(
      (invited) => {
        setOpen(false);
        reset(emptyInvitation);
        onNotice({
          tone: 'success',
          text: `Invitation sent to ${invited.email}. The link in it works for 72 hours.`,
        });
      },
      (error: unknown) =>
        applyApiError(error, setError, { fields: ['displayName', 'email', 'role'] }),
    ),
  );

  return (
    <Dialog.Root
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (!next) reset(emptyInvitation);
      }}
    >
      <Dialog.Trigger>
        <Button highContrast>
          <PlusIcon aria-hidden />
          Invite someone
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="480px">
        <Dialog.Title>Invite someone to the desk</Dialog.Title>
        <Dialog.Description size="2" mb="4">
          They get an e-mail with a link to choose a password. The link works for 72 hours.
        </Dialog.Description>
        <form onSubmit={onSubmit} noValidate aria-label="Invite someone">
          <Flex direction="column" gap="4">
            <FormError message={errors.root?.server?.message} />
            <TextInputField
              label="Name"
              autoComplete="off"
              error={errors.displayName?.message}
              {...register('displayName')}
            />
            <TextInputField
              label="E-mail"
              type="email"
              autoComplete="off"
              error={errors.email?.message}
              {...register('email')}
            />
            <Controller
              control={control}
              name="role"
              render={({ field }) => (
                <SelectField
                  label="Role"
                  name={field.name}
                  value={field.value}
                  options={roleOptions}
                  onValueChange={field.onChange}
                  triggerRef={field.ref}
                  hint={roleDuties[field.value].summary}
                  error={errors.role?.message}
                />
              )}
            />
            <Flex gap="3" justify="end" mt="2" wrap="wrap">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray" highContrast>
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" highContrast loading={isSubmitting}>
                Send invitation
              </Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
