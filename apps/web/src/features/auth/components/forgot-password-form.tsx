import { zodResolver } from '@hookform/resolvers/zod';
import { EnvelopeClosedIcon } from '@radix-ui/react-icons';
import { Button, Callout, Flex } from '@radix-ui/themes';
import { passwordResetRequestSchema, type PasswordResetRequestRequest } from '@skyledger/contracts';
import { useForm } from 'react-hook-form';
import { FormError } from '@/components/ui/form-error';
import { TextInputField } from '@/components/ui/text-input-field';
import { applyApiError } from '@/lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm() {
  const requestReset = useRequestPasswordReset();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<PasswordResetRequestRequest>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });

  const onSubmit = handleSubmit((values) =>
    requestReset
      .mutateAsync(values)
      .catch((error: unknown) => applyApiError(error, setError, { fields: ['email'] })),
  );

  if (requestReset.isSuccess) {
    return (
      <Callout.Root role="status" color="jade">
        <Callout.Icon>
          <EnvelopeClosedIcon aria-hidden />
        </Callout.Icon>
        <Callout.Text>
          If an account exists for <strong>{requestReset.variables.email}</strong>, we sent it a
          link to choose a new password. Check your inbox, and the spam folder too.
        </Callout.Text>
      </Callout.Root>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Request a password reset">
      <Flex direction="column" gap="4">
        <FormError message={errors.root?.server?.message} />
        <TextInputField
          label="E-mail"
          type="email"
          autoComplete="email"
          error={errors.email?.message}
          {...register('email')}
        />
        <Button type="submit" size="3" highContrast loading={requestReset.isPending}>
          Send the reset link
        </Button>
      </Flex>
    </form>
  );
}
