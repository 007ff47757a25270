import { Text } from '@radix-ui/themes';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { PlainCard } from '@/components/layouts/plain-card';
import { PlainLayout } from '@/components/layouts/plain-layout';
import { AppLink } from '@/components/ui/app-link';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths, safeNextPath } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';

export function Component() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNextPath(searchParams.get('next'));

  return (
    <PlainLayout>
      <DocumentTitle title="Sign in" />
      <PlainCard
        title="Sign in to the desk"
        intro="Log claims, trace where they came from, weigh the evidence and sign verdicts off, all on the record."
        footer={
          <>
            <Text size="2">
              <AppLink to={paths.auth.forgotPassword.getHref()}>Forgot your password?</AppLink>
            </Text>
            <Text size="2" color="gray">
              New to the desk? Your desk chief sends you an invitation by e-mail.
            </Text>
          </>
        }
      >
        <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
      </PlainCard>
    </PlainLayout>
  );
}
