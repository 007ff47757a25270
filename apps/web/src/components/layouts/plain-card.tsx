import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

interface PlainCardProps {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
  /** Links under the card, such as "Forgot your password?". */
  footer?: ReactNode;
}

export function PlainCard({ title, intro, children, footer }: PlainCardProps) {
  return (
    <Flex direction="column" gap="4">
      <Card size={{ initial: '2', sm: '4' }}>
        <Flex direction="column" gap="5">
          <Flex direction="column" gap="2">
            <Heading as="h1" size="7">
              {title}
            </Heading>
            {intro ? (
              <Text as="p" color="gray" className="sl-prose" size="2">
                {intro}
              </Text>
            ) : null}
          </Flex>
          {children}
        </Flex>
      </Card>
      {footer ? (
        <Flex direction="column" gap="2" px="2">
          {footer}
        </Flex>
      ) : null}
    </Flex>
  );
}
