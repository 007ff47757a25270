import { Flex, Text } from '@radix-ui/themes';
import { ratingLevelName, useRatingLevels } from '@/features/rating-scale/api/get-rating-levels';

interface RatingWordsProps {
  ratingId: string | null;
  /** One line, "Rating: 5 · Contradicted by evidence", for lists of versions. */
  compact?: boolean;
}

/** A rating in words, with what it means on the desk's scale; never a colour alone. */
export function RatingWords({ ratingId, compact = false }: RatingWordsProps) {
  const { data: levels } = useRatingLevels();
  const level = levels.find((candidate) => candidate.id === ratingId);
  const name = !ratingId
    ? 'No rating chosen yet'
    : level
      ? ratingLevelName(level)
      : `${ratingId} (no longer on the scale)`;
  if (compact || !level) {
    return (
      <Text size="2" color={ratingId ? undefined : 'gray'}>
        {compact && ratingId ? 'Rating: ' : ''}
        <Text weight="bold">{name}</Text>
      </Text>
    );
  }
  return (
    <Flex direction="column" gap="1">
      <Text weight="bold" size="4">
        {name}
      </Text>
      <Text size="2" color="gray">
        {level.description}
      </Text>
    </Flex>
  );
}
