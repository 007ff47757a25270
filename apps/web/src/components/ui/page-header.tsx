import { Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

interface PageHeaderProps {
  title: ReactNode;
  /** One sentence saying what the page is for, so a newcomer knows where they are. */
  purpose: ReactNode;
  /** A way back, or badges, above the heading. */
  above?: ReactNode;
  /** Lines under the purpose that are about this one record (who filed it, when). */
  below?: ReactNode;
  /** The page's main action, beside the heading on a wide screen and under it on a phone. */
  action?: ReactNode;
}

/** The top of every desk page: its heading, what it is for, and its main action. */
export function PageHeader({ title, purpose, above, below, action }: PageHeaderProps) {
  return (
    <Flex justify="between" align={{ initial: 'start', sm: 'end' }} gap="4" wrap="wrap">
      <Flex direction="column" gap="2" align="start" maxWidth="820px">
        {above}
        <Heading as="h1" size={{ initial: '6', sm: '7' }} className="sl-break">
          {title}
        </Heading>
        <Text as="p" color="gray" className="sl-prose" size={{ initial: '2', sm: '3' }}>
          {purpose}
        </Text>
        {below}
      </Flex>
      {action}
    </Flex>
  );
}
