import { Button, Flex, Heading, Text } from '@radix-ui/themes';
import { roleLabels } from '@skyledger/contracts';
import { Link as RouterLink } from 'react-router-dom';
import { DocumentTitle } from '@/components/ui/document-title';
import { paths } from '@/config/paths';
import type { NavItem } from '../../nav-items';

/** Shown in place of a page the person's role may not open. */
export function NoAccess({ item }: { item: NavItem }) {
  const allowed = item.roles.map((role) => roleLabels[role].toLowerCase()).join(', ');
  return (
    <Flex direction="column" gap="4" align="start">
      <DocumentTitle title="No access" />
      <Heading as="h1" size="7">
        You don&apos;t have access
      </Heading>
      <Text as="p" className="sl-prose">
        The {item.label} page is open to these roles only: {allowed}. If you need something done
        there, ask your desk chief.
      </Text>
      <Button asChild highContrast>
        <RouterLink to={paths.app.desk.getHref()}>Back to the desk</RouterLink>
      </Button>
    </Flex>
  );
}
