import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Flex } from '@radix-ui/themes';
import { newPasswordSchema, PASSWORD_MIN_LENGTH } from '@skyledger/contracts';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { FormError } from '@/components/ui/form-error';
import { TextInputField } from '@/components/ui/text-input-field';
import { applyApiError } from '@/lib/form-errors';

const newPasswordFormSchema = z
  .object({ password: newPasswordSchema, confirmPassword: z.string() })
  .refine((values) => values.password === values.confirmPassword, {
    path: ['confirmPassword'],
    error: 'The two passwords are not the same',
  });
type NewPasswordFormValues = z.infer<typeof newPasswordFormSchema>;

interface NewPasswordFormProps {
  /** The account the password is for, so password managers save it under the right name. */
  email?: string;
  submitLabel: string;
  submit: (password: string) => Promise<unknown>;
  /** What a 404 or 410 from this form's endpoint means, in words. */
  statusMessages: Partial<Record<number, string>>;
}

/** Choose a password and type it again: shared by accepting an invitation and resetting. */
export function NewPasswordForm({
  email,
  submitLabel,
  submit,
  statusMessages,
}: NewPasswordFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<NewPasswordFormValues>({
    resolver: zodResolver(newPasswordFormSchema),
    defaultValues: { password: '', confirmPassword: '' },
  });

  const onSubmit = handleSubmit(({ password }) =>
    submit(password).catch((error: unknown) =>
      applyApiError(error, setError, {
        fields: ['password'],
        overrides: {
          password: { minLength: `Too short: use at least ${PASSWORD_MIN_LENGTH} characters` },
        },
        statusMessages,
      }),
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Choose a password">
      <Flex direction="column" gap="4">
        <FormError message={errors.root?.server?.message} />
        {email ? (
          <input type="hidden" name="username" autoComplete="username" value={email} />
        ) : null}
        <TextInputField
          label="New password"
          type="password"
          autoComplete="new-password"
          hint={`Use ${PASSWORD_MIN_LENGTH} characters or more. A few unrelated words make a strong one.`}
          error={errors.password?.message}
          {...register('password')}
        />
        <TextInputField
          label="New password again"
          type="password"
          autoComplete="new-password"
          error={errors.confirmPassword?.message}
          {...register('confirmPassword')}
        />
        <Button type="submit" size="3" highContrast loading={isSubmitting}>
          {submitLabel}
        </Button>
      </Flex>
    </form>
  );
}
