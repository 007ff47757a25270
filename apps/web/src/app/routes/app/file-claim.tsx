import { Flex, Heading, Text } from '@radix-ui/themes';
import { DocumentTitle } from '@/components/ui/document-title';
import { useCurrentUser } from '@/features/auth/current-user';
import { FileClaimForm } from '@/features/claims/components/file-claim/file-claim-form';
import { mayOpen, navItem } from '../../nav-items';
import { NoAccess } from './no-access';

export function Component() {
  const user = useCurrentUser();
  if (!mayOpen(user.role, 'file-claim')) return <NoAccess item={navItem('file-claim')} />;
  return (
    <Flex direction="column" gap="5" maxWidth="760px">
      <DocumentTitle title="File a claim" />
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          File a claim
        </Heading>
        <Text color="gray">
          Log a claim you met on the beat: what was said, who said it, and where you saw it.
        </Text>
      </Flex>
      <FileClaimForm />
    </Flex>
  );
}
