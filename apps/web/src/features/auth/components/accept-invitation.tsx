import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Button, Callout, DataList, Flex, Heading, Skeleton, Text } from '@radix-ui/themes';
import { roleLabels } from '@skyledger/contracts';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/api-error-messages';
import { formatDateTime } from '@/lib/format-date';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useInvitation } from '../api/get-invitation';
import { invitationStatusMessages } from './link-status-messages';
import { NewPasswordForm } from './new-password-form';
import { PasswordSetNotice } from './password-set-notice';

function LinkProblem({ message }: { message: string }) {
  return (
    <Flex direction="column" gap="4">
      <Callout.Root color="red" role="alert">
        <Callout.Icon>
          <ExclamationTriangleIcon aria-hidden />
        </Callout.Icon>
        <Callout.Text>{message}</Callout.Text>
      </Callout.Root>
      <Button asChild size="3" variant="soft" highContrast>
        <RouterLink to={paths.auth.signIn.getHref()}>Go to sign-in</RouterLink>
      </Button>
    </Flex>
  );
}

export function AcceptInvitation({ token }: { token: string }) {
  const invitation = useInvitation(token);
  const accept = useAcceptInvitation();

  if (invitation.isPending) {
    return (
      <Flex direction="column" gap="3" aria-busy="true">
        <Text color="gray">Checking your invitation…</Text>
        <Skeleton height="120px" />
      </Flex>
    );
  }
  if (invitation.isError) {
    const { error } = invitation;
    const known = isApiError(error) && (error.status === 404 || error.status === 410);
    return (
      <LinkProblem message={known ? invitationStatusMessages[error.status] : errorMessage(error)} />
    );
  }

  const { displayName, email, role, expiresAt } = invitation.data;
  if (accept.isSuccess) {
    return (
      <PasswordSetNotice>
        Your password is set, {displayName}. Sign in with {email} to open the desk.
      </PasswordSetNotice>
    );
  }

  return (
    <Flex direction="column" gap="5">
      <Flex direction="column" gap="3">
        <Heading as="h2" size="3">
          Your invitation
        </Heading>
        <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }}>
          <DataList.Item>
            <DataList.Label>Name</DataList.Label>
            <DataList.Value>{displayName}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>E-mail</DataList.Label>
            <DataList.Value>{email}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Role</DataList.Label>
            <DataList.Value>{roleLabels[role]}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Link works until</DataList.Label>
            <DataList.Value>
              <time dateTime={expiresAt}>{formatDateTime(expiresAt)}</time>
            </DataList.Value>
          </DataList.Item>
        </DataList.Root>
      </Flex>
      <NewPasswordForm
        email={email}
        submitLabel="Set my password"
        submit={(password) => accept.mutateAsync({ token, password })}
        statusMessages={invitationStatusMessages}
      />
    </Flex>
  );
}
