import { Box } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/**
 * A list as cards on a phone and as a table from the `md` breakpoint on. Both are rendered
 * and CSS shows one, so the page never jumps from one to the other after it has drawn.
 */
export function CardsOrTable({ cards, table }: { cards: ReactNode; table: ReactNode }) {
  return (
    <>
      <Box display={{ initial: 'block', md: 'none' }}>{cards}</Box>
      <Box display={{ initial: 'none', md: 'block' }}>{table}</Box>
    </>
  );
}
