import { Text } from '@radix-ui/themes';
import { useSearchParams } from 'react-router-dom';
import { PlainCard } from '@/components/layouts/plain-card';
import { PlainLayout } from '@/components/layouts/plain-layout';
import { AppLink } from '@/components/ui/app-link';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';
import { ResetPassword } from '@/features/auth/components/reset-password';
import { MissingToken } from './missing-token';

export function Component() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token');

  return (
    <PlainLayout>
      <DocumentTitle title="Choose a new password" />
      <PlainCard
        title="Choose a new password"
        intro="After this, sign in with the new password. The old one stops working."
        footer={
          <Text size="2">
            <AppLink to={paths.auth.forgotPassword.getHref()}>Ask for a new reset link</AppLink>
          </Text>
        }
      >
        {token ? <ResetPassword token={token} /> : <MissingToken what="password reset" />}
      </PlainCard>
    </PlainLayout>
  );
}
