import { Badge, Card, Flex, Link, Text, VisuallyHidden } from '@radix-ui/themes';
import { updateNoteKindLabels, type PublicationView } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { inItsZone, publicationStateColors, publicationStateLabels } from '../publishing-words';

function When({ publication }: { publication: PublicationView }) {
  const { state, publishedAt, scheduledFor, scheduledTimeZone } = publication;
  if (state === 'published' && publishedAt) {
    return (
      <>
        Published <DateTime value={publishedAt} />
      </>
    );
  }
  if (scheduledFor && scheduledTimeZone) {
    return (
      <>
        {state === 'scheduled' ? 'To be published ' : 'Was scheduled for '}
        <time dateTime={scheduledFor}>{inItsZone(scheduledFor, scheduledTimeZone)}</time>
      </>
    );
  }
  return null;
}

/** Every publication of the claim, latest first, each with its note and its reader address. */
export function PublicationsList({ publications }: { publications: PublicationView[] }) {
  if (publications.length === 0) {
    return <Text color="gray">Nothing published or scheduled yet.</Text>;
  }
  return (
    <ol className="sl-card-list" aria-label="Publications, latest first">
      {publications.map((publication) => (
        <li key={publication.id}>
          <Card size="2">
            <Flex direction="column" gap="2">
              <Flex gap="2" align="center" wrap="wrap">
                <Text weight="bold">Publication {publication.sequence}</Text>
                <Badge
                  color={publicationStateColors[publication.state]}
                  variant="soft"
                  highContrast
                >
                  {publicationStateLabels[publication.state]}
                </Badge>
                <Text size="2" color="gray">
                  verdict version {publication.versionNumber}
                </Text>
              </Flex>
              <Text size="2">
                <When publication={publication} />
              </Text>
              {publication.note ? (
                <Text as="p" size="2" className="sl-break">
                  <Text weight="bold">{updateNoteKindLabels[publication.note.kind]}:</Text>{' '}
                  {publication.note.text}
                </Text>
              ) : publication.sequence === 1 ? (
                <Text size="2" color="gray">
                  The first publication: no update note.
                </Text>
              ) : null}
              {publication.state === 'published' && publication.url ? (
                <Link
                  href={publication.url}
                  target="_blank"
                  rel="noopener noreferrer"
                  size="2"
                  highContrast
                  className="sl-break"
                >
                  Publication {publication.sequence} as readers see it
                  <VisuallyHidden> (opens in a new tab)</VisuallyHidden>
                </Link>
              ) : null}
            </Flex>
          </Card>
        </li>
      ))}
    </ol>
  );
}
