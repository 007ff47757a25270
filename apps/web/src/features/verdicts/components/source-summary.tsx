import { Badge, Flex, Text } from '@radix-ui/themes';
import { sourceKindLabels, type ClaimSourceView } from '@skyledger/contracts';
import { GradeBadge } from '@/features/claims/components/claim/sources/grade-badge';

/** A source in a few words: its title, its kind and the desk's grade of it. */
export function SourceSummary({ source }: { source: ClaimSourceView }) {
  return (
    <Flex direction="column" gap="1">
      <Text size="2" weight="bold">
        {source.title}
      </Text>
      <Flex gap="2" wrap="wrap">
        <Badge color="gray" variant="outline" highContrast>
          {sourceKindLabels[source.kind]}
        </Badge>
        <GradeBadge grade={source.grade} />
      </Flex>
    </Flex>
  );
}
