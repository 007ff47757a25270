import { Card, DataList, Flex, Text } from '@radix-ui/themes';
import { roleLabels, userStatusLabels } from '@skyledger/contracts';
import { DocumentTitle } from '@/components/ui/document-title';
import { PageHeader } from '@/components/ui/page-header';
import { useCurrentUser } from '@/features/auth/current-user';
import { SignOutButton } from '@/features/auth/components/sign-out-button';
import { NotificationSettings } from '@/features/notifications/components/notification-settings';

export function Component() {
  const user = useCurrentUser();

  return (
    <Flex direction="column" gap="5" maxWidth="640px">
      <DocumentTitle title="Account" />
      <PageHeader
        title="Your account"
        purpose="Who you are on the desk, what your role lets you do, and which mails the desk sends you."
      />
      <Card size="3">
        <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }}>
          <DataList.Item>
            <DataList.Label>Name</DataList.Label>
            <DataList.Value>{user.displayName}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>E-mail</DataList.Label>
            <DataList.Value>{user.email}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Role</DataList.Label>
            <DataList.Value>{roleLabels[user.role]}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Status</DataList.Label>
            <DataList.Value>{userStatusLabels[user.status]}</DataList.Value>
          </DataList.Item>
        </DataList.Root>
      </Card>
      <NotificationSettings />
      <Text as="p" color="gray" className="sl-prose" size="2">
        A desk chief sets names and roles. To change your password, sign out and use &ldquo;Forgot
        your password?&rdquo; on the sign-in page.
      </Text>
      <Flex>
        <SignOutButton />
      </Flex>
    </Flex>
  );
}
