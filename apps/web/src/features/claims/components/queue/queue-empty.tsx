import { Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';

interface QueueEmptyProps {
  filtered: boolean;
  mayFile: boolean;
}

/** What an empty queue says: nothing matches these filters, or nothing is filed yet. */
export function QueueEmpty({ filtered, mayFile }: QueueEmptyProps) {
  return (
    <Card size="3">
      <Flex direction="column" gap="3" align="start">
        <Heading as="h2" size="4">
          {filtered ? 'No claims match these filters' : 'No claims on the desk yet'}
        </Heading>
        <Text as="p" color="gray">
          {filtered
            ? 'Widen the filters, or clear them to see the whole queue.'
            : 'Claims appear here as soon as someone on the desk files one.'}
        </Text>
        {filtered ? (
          <Button asChild variant="soft" color="gray" highContrast>
            <RouterLink to={paths.app.queue.getHref()}>Clear all filters</RouterLink>
          </Button>
        ) : mayFile ? (
          <Button asChild highContrast>
            <RouterLink to={paths.app.fileClaim.getHref()}>File a claim</RouterLink>
          </Button>
        ) : null}
      </Flex>
    </Card>
  );
}
