import { Text } from '@radix-ui/themes';
import { PlainCard } from '@/components/layouts/plain-card';
import { PlainLayout } from '@/components/layouts/plain-layout';
import { AppLink } from '@/components/ui/app-link';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

export function Component() {
  return (
    <PlainLayout>
      <DocumentTitle title="Forgot password" />
      <PlainCard
        title="Forgot your password?"
        intro="Give the e-mail address you sign in with. We will send it a link to choose a new password."
        footer={
          <Text size="2">
            <AppLink to={paths.auth.signIn.getHref()}>Back to sign-in</AppLink>
          </Text>
        }
      >
        <ForgotPasswordForm />
      </PlainCard>
    </PlainLayout>
  );
}
