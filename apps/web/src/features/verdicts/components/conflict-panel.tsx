import { Button, Callout, Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import type { ClaimSourceView, VerdictVersionView } from '@skyledger/contracts';
import { explainerPlainText } from '@skyledger/explainer';
import { DateTime } from '@/components/ui/date-time';
import { RatingWords } from './rating-words';
import { VersionDiff, type ComparableVerdict } from './version-diff';

export interface DraftConflict {
  /** What this editor tried to save, still in the editor. */
  mine: ComparableVerdict;
  /** The version as stored now, saved by someone else meanwhile. */
  saved: VerdictVersionView;
  /** The editor chose to keep their text: the next save replaces the stored one. */
  kept: boolean;
}

function VerdictText({ verdict }: { verdict: ComparableVerdict }) {
  const explainer = verdict.body ? explainerPlainText(verdict.body) : '';
  return (
    <Flex direction="column" gap="2">
      <RatingWords ratingId={verdict.ratingId} compact />
      <Text as="p" weight="medium">
        {verdict.bottomLine || 'No bottom line'}
      </Text>
      <Text as="p" size="2" className="sl-pre-line sl-break">
        {explainer || 'No explainer text'}
      </Text>
    </Flex>
  );
}

interface ConflictPanelProps {
  conflict: DraftConflict;
  sources: readonly ClaimSourceView[];
  onTakeSaved: () => void;
  onKeepMine: () => void;
  onClose: () => void;
}

/**
 * Two saves of one draft crossed: both texts side by side, with what differs, so the
 * editor can take the stored one, or keep theirs and merge in what they want from the other.
 */
export function ConflictPanel({
  conflict,
  sources,
  onTakeSaved,
  onKeepMine,
  onClose,
}: ConflictPanelProps) {
  const { mine, saved, kept } = conflict;
  const frozen = saved.state !== 'draft';
  return (
    <Card size="3" asChild className="sl-conflict">
      <section aria-labelledby="draft-conflict-title">
        <Flex direction="column" gap="4">
          <Heading as="h3" size="4" id="draft-conflict-title">
            {kept ? 'Merging with the saved text' : 'Someone else saved this draft first'}
          </Heading>
          <Callout.Root color="amber" highContrast role="alert">
            <Callout.Text>
              {kept
                ? 'Your text stays in the editor; saving now replaces the saved one. Copy across what you want to keep from it first.'
                : frozen
                  ? `${saved.lastEditedBy.displayName}’s version was submitted for sign-off meanwhile and can no longer change. Your text was not saved: copy what you need from it below.`
                  : `${saved.lastEditedBy.displayName} saved this draft while you were editing, so your text was not saved. Both are below: take theirs, or keep yours and merge.`}
            </Callout.Text>
          </Callout.Root>
          <Grid columns={{ initial: '1', md: '2' }} gap="4">
            <Flex asChild direction="column" gap="2">
              <section aria-label="Your unsaved text">
                <Heading as="h4" size="3">
                  Your unsaved text
                </Heading>
                <VerdictText verdict={mine} />
              </section>
            </Flex>
            <Flex asChild direction="column" gap="2">
              <section aria-label="The saved version">
                <Heading as="h4" size="3">
                  Saved by {saved.lastEditedBy.displayName}
                </Heading>
                <Text size="1" color="gray">
                  <DateTime value={saved.updatedAt} />
                </Text>
                <VerdictText verdict={saved} />
              </section>
            </Flex>
          </Grid>
          <details>
            <Text asChild size="2" weight="medium">
              <summary className="sl-details-summary">
                What differs, from the saved text to yours
              </summary>
            </Text>
            <Flex direction="column" mt="2">
              <VersionDiff before={saved} after={mine} sources={sources} />
            </Flex>
          </details>
          <Flex gap="3" wrap="wrap">
            {kept ? (
              <Button type="button" variant="soft" color="gray" highContrast onClick={onClose}>
                Done merging
              </Button>
            ) : (
              <>
                <Button type="button" highContrast onClick={onTakeSaved}>
                  Take the saved version
                </Button>
                {frozen ? null : (
                  <Button
                    type="button"
                    variant="soft"
                    color="gray"
                    highContrast
                    onClick={onKeepMine}
                  >
                    Keep my text and merge
                  </Button>
                )}
              </>
            )}
          </Flex>
        </Flex>
      </section>
    </Card>
  );
}
