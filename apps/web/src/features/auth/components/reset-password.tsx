import { useResetPassword } from '../api/reset-password';
import { resetStatusMessages } from './link-status-messages';
import { NewPasswordForm } from './new-password-form';
import { PasswordSetNotice } from './password-set-notice';

export function ResetPassword({ token }: { token: string }) {
  const reset = useResetPassword();

  if (reset.isSuccess) {
    return <PasswordSetNotice>Your new password is set. Sign in with it now.</PasswordSetNotice>;
  }

  return (
    <NewPasswordForm
      submitLabel="Set the new password"
      submit={(password) => reset.mutateAsync({ token, password })}
      statusMessages={resetStatusMessages}
    />
  );
}
