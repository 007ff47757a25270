import { Flex } from '@radix-ui/themes';
import { DocumentTitle } from '@/components/ui/document-title';
import { PageHeader } from '@/components/ui/page-header';
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
      <PageHeader
        title="File a claim"
        purpose="Log a claim you met on the beat: what was said, who said it, and where you saw it. Earlier claims like it show as you type, so the desk does not check the same thing twice."
      />
      <FileClaimForm />
    </Flex>
  );
}
