import { Box, Container, Flex, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { Wordmark } from '@/components/ui/wordmark';

/** The frame of pages outside the signed-in desk: sign-in, links from e-mails, errors. */
export function PlainLayout({ children }: { children: ReactNode }) {
  return (
    <Flex direction="column" className="sl-plain-page">
      <Box asChild px="5" py="4">
        <header>
          <Wordmark />
        </header>
      </Box>
      <Box asChild flexGrow="1" px="4" py={{ initial: '4', sm: '8' }}>
        <main>
          <Container size="1">{children}</Container>
        </main>
      </Box>
      <Box asChild px="5" py="4">
        <footer>
          <Text size="1" color="gray">
            Skyledger — the climate-claim desk. Every claim traced, every verdict signed off by a
            second pair of eyes.
          </Text>
        </footer>
      </Box>
    </Flex>
  );
}
