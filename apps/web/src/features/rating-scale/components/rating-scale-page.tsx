import { Badge, Card, Code, Flex, Heading, Text } from '@radix-ui/themes';
import type { RatingLevelView } from '@skyledger/contracts';
import { PageHeader } from '@/components/ui/page-header';
import { useShowNotice, type ShowNotice } from '@/components/ui/toaster';
import { ratingLevelName, useRatingLevels } from '../api/get-rating-levels';
import { AddRatingLevelDialog } from './add-rating-level-dialog';
import { DeleteRatingLevelDialog } from './delete-rating-level-dialog';
import { EditRatingLevelDialog } from './edit-rating-level-dialog';

interface RatingLevelItemProps {
  level: RatingLevelView;
  mayEdit: boolean;
  onNotice: ShowNotice;
}

function RatingLevelItem({ level, mayEdit, onNotice }: RatingLevelItemProps) {
  const headingId = `rating-level-${level.id}`;
  return (
    <Card size="2" asChild>
      <article aria-labelledby={headingId}>
        <Flex direction="column" gap="2">
          <Flex gap="2" align="center" wrap="wrap">
            <Heading as="h2" size="4" id={headingId}>
              {ratingLevelName(level)}
            </Heading>
            <Badge color="gray" variant="outline" highContrast>
              {level.isRating ? 'Rating' : 'Outcome, not a rating'}
            </Badge>
            {level.inUse ? (
              <Badge color="blue" variant="soft" highContrast>
                In use
              </Badge>
            ) : null}
          </Flex>
          <Text as="p" className="sl-prose">
            {level.description}
          </Text>
          <Text size="1" color="gray">
            Id{' '}
            <Code size="1" variant="ghost">
              {level.id}
            </Code>{' '}
            · version {level.version}
          </Text>
          {mayEdit ? (
            <Flex gap="3" align="center" wrap="wrap" mt="1">
              <EditRatingLevelDialog level={level} onNotice={onNotice} />
              <DeleteRatingLevelDialog level={level} onNotice={onNotice} />
            </Flex>
          ) : null}
        </Flex>
      </article>
    </Card>
  );
}

/** The desk's rating scale: everyone reads it, a desk chief words it. */
export function RatingScalePage({ mayEdit }: { mayEdit: boolean }) {
  const { data: levels } = useRatingLevels();
  const showNotice = useShowNotice();
  return (
    <Flex direction="column" gap="5" maxWidth="820px">
      <PageHeader
        title="Rating scale"
        purpose={`The words every verdict is rated in, from what holds up best to what the evidence contradicts, and the outcomes that are not ratings. Readers see the same words on the methodology page.${mayEdit ? ' You may reword a level, add one, or delete one no verdict uses.' : ' A desk chief words the scale.'}`}
        action={mayEdit ? <AddRatingLevelDialog onNotice={showNotice} /> : null}
      />
      <Flex direction="column">
        <ol className="sl-card-list" aria-label="Levels of the scale">
          {levels.map((level) => (
            <li key={level.id}>
              <RatingLevelItem level={level} mayEdit={mayEdit} onNotice={showNotice} />
            </li>
          ))}
        </ol>
      </Flex>
    </Flex>
  );
}
