import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Flex } from '@radix-ui/themes';
import { signInSchema, type SignInRequest } from '@skyledger/contracts';
import { useForm } from 'react-hook-form';
import { FormError } from '@/components/ui/form-error';
import { TextInputField } from '@/components/ui/text-input-field';
import { applyApiError } from '@/lib/form-errors';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<SignInRequest>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit((values) =>
    signIn
      .mutateAsync(values)
      .then(onSignedIn, (error: unknown) =>
        applyApiError(error, setError, { fields: ['email', 'password'] }),
      ),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Sign in">
      <Flex direction="column" gap="4">
        <FormError message={errors.root?.server?.message} />
        <TextInputField
          label="E-mail"
          type="email"
          autoComplete="username"
          error={errors.email?.message}
          {...register('email')}
        />
        <TextInputField
          label="Password"
          type="password"
          autoComplete="current-password"
          error={errors.password?.message}
          {...register('password')}
        />
        <Button type="submit" size="3" highContrast loading={signIn.isPending}>
          Sign in
        </Button>
      </Flex>
    </form>
  );
}
