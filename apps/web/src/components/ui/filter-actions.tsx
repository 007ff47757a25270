import { Button, Flex } from '@radix-ui/themes';

/** The two buttons under a filter form: apply what it says (its submit), or clear it all. */
export function FilterActions({ onClear }: { onClear: () => void }) {
  return (
    <Flex gap="3" wrap="wrap">
      <Button type="submit" highContrast>
        Apply filters
      </Button>
      <Button type="button" variant="soft" color="gray" highContrast onClick={onClear}>
        Clear all filters
      </Button>
    </Flex>
  );
}
