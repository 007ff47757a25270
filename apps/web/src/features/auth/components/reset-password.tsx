import { CheckCircledIcon } from '@radix-ui/react-icons';
import { Button, Callout, Flex } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useResetPassword } from '../api/reset-password';
import { resetStatusMessages } from './link-status-messages';
import { NewPasswordForm } from './new-password-form';

export function ResetPassword({ token }: { token: string }) {
  const reset = useResetPassword();

  if (reset.isSuccess) {
    return (
      <Flex direction="column" gap="4">
        <Callout.Root color="jade" role="status">
          <Callout.Icon>
            <CheckCircledIcon aria-hidden />
          </Callout.Icon>
          <Callout.Text>Your new password is set. Sign in with it now.</Callout.Text>
        </Callout.Root>
        <Button asChild size="3" highContrast>
          <RouterLink to={paths.auth.signIn.getHref()}>Sign in</RouterLink>
        </Button>
      </Flex>
    );
  }

  return (
    <NewPasswordForm
      submitLabel="Set the new password"
      submit={(password) => reset.mutateAsync({ token, password })}
      statusMessages={resetStatusMessages}
    />
  );
}
