import { Flex, Heading, Text, VisuallyHidden } from '@radix-ui/themes';
import type {
  ClaimAsCleared,
  ClaimSourceView,
  RatingLevelView,
  VerdictVersionView,
} from '@skyledger/contracts';
import { explainerPlainText } from '@skyledger/explainer';
import { diffWords } from 'diff';
import { useMemo } from 'react';
import { ratingLevelName, useRatingLevels } from '@/features/rating-scale/api/get-rating-levels';

/** What two texts of a verdict are compared on: the words readers see. */
export type ComparableVerdict = Pick<
  VerdictVersionView,
  'ratingId' | 'bottomLine' | 'primarySourceId'
> & { body: VerdictVersionView['body'] | null };

const wordCount = (text: string) => text.split(/\s+/).filter(Boolean).length;

function WordDiff({ title, before, after }: { title: string; before: string; after: string }) {
  const parts = useMemo(() => diffWords(before, after), [before, after]);
  const added = parts.filter((part) => part.added).reduce((n, p) => n + wordCount(p.value), 0);
  const removed = parts.filter((part) => part.removed).reduce((n, p) => n + wordCount(p.value), 0);
  return (
    <Flex direction="column" gap="1">
      <Heading as="h4" size="2">
        {title}
      </Heading>
      <Text size="2" color="gray">
        {added === 0 && removed === 0
          ? 'Unchanged.'
          : `${added} ${added === 1 ? 'word' : 'words'} added, ${removed} removed.`}
      </Text>
      {added || removed ? (
        <p className="sl-diff">
          {parts.map((part, index) =>
            part.added ? (
              <ins key={index}>
                <VisuallyHidden>[added: </VisuallyHidden>
                {part.value}
                <VisuallyHidden>]</VisuallyHidden>
              </ins>
            ) : part.removed ? (
              <del key={index}>
                <VisuallyHidden>[removed: </VisuallyHidden>
                {part.value}
                <VisuallyHidden>]</VisuallyHidden>
              </del>
            ) : (
              <span key={index}>{part.value}</span>
            ),
          )}
        </p>
      ) : null}
    </Flex>
  );
}

function ratingName(levels: readonly RatingLevelView[], id: string | null): string {
  if (!id) return 'none';
  const level = levels.find((candidate) => candidate.id === id);
  return level ? ratingLevelName(level) : id;
}

function sourceName(sources: readonly ClaimSourceView[], id: string | null): string {
  if (!id) return 'none';
  return sources.find((source) => source.id === id)?.title ?? 'a source no longer on the claim';
}

interface VersionDiffProps {
  before: ComparableVerdict;
  after: ComparableVerdict;
  sources: readonly ClaimSourceView[];
}

/** Words added and removed between two texts of a verdict, with the rating and source changes. */
export function VersionDiff({ before, after, sources }: VersionDiffProps) {
  const { data: levels } = useRatingLevels();
  const plain = (body: ComparableVerdict['body']) => (body ? explainerPlainText(body) : '');
  return (
    <Flex direction="column" gap="3">
      <Text size="2">
        Rating:{' '}
        {before.ratingId === after.ratingId
          ? `unchanged (${ratingName(levels, after.ratingId)})`
          : `${ratingName(levels, before.ratingId)} → ${ratingName(levels, after.ratingId)}`}
      </Text>
      <Text size="2">
        Primary source:{' '}
        {before.primarySourceId === after.primarySourceId
          ? 'unchanged'
          : `${sourceName(sources, before.primarySourceId)} → ${sourceName(sources, after.primarySourceId)}`}
      </Text>
      <WordDiff title="Bottom line" before={before.bottomLine} after={after.bottomLine} />
      <WordDiff title="Explainer" before={plain(before.body)} after={plain(after.body)} />
    </Flex>
  );
}

/**
 * How the claim readers are shown changes: as cleared with an earlier version, against
 * the claim as it stands, which clearing this version gives readers.
 */
export function ClaimDiff({ before, after }: { before: ClaimAsCleared; after: ClaimAsCleared }) {
  return (
    <Flex direction="column" gap="3">
      <Text size="2">
        Who said it:{' '}
        {before.claimantName === after.claimantName
          ? 'unchanged'
          : `${before.claimantName} → ${after.claimantName}`}
      </Text>
      <WordDiff title="What was said" before={before.text} after={after.text} />
      <WordDiff title="Summary" before={before.summary} after={after.summary} />
    </Flex>
  );
}
