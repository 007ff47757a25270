import { Flex, Heading } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** A part of the claim page: its heading, and the action the person's role may take there. */
export function SectionHeader({ title, action }: { title: string; action?: ReactNode }) {
  return (
    <Flex justify="between" align="center" gap="3" wrap="wrap">
      <Heading as="h2" size="5">
        {title}
      </Heading>
      {action}
    </Flex>
  );
}
