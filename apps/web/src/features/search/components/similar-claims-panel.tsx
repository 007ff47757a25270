import { ExternalLinkIcon } from '@radix-ui/react-icons';
import { Card, Flex, Heading, Link, Text, VisuallyHidden } from '@radix-ui/themes';
import { SIMILAR_TEXT_MIN_LENGTH } from '@skyledger/contracts';
import { useQuery } from '@tanstack/react-query';
import { useId } from 'react';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import { paths } from '@/config/paths';
import { ClaimStatusBadge } from '@/features/claims/components/claim-status-badge';
import {
  ratingLevelName,
  ratingLevelsQueryOptions,
} from '@/features/rating-scale/api/get-rating-levels';
import { errorMessage } from '@/lib/api-error-messages';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { useSimilarClaims } from '../api/get-similar-claims';

/** How long the text must rest before the desk is asked: a pause in typing, not every key. */
export const SIMILAR_CLAIMS_DEBOUNCE_MS = 300;

const claimsWord = (count: number) => (count === 1 ? 'claim' : 'claims');

/** A published claim's rating in words and a link to its explainer. */
function PublishedVerdict({
  rating,
  explainerUrl,
}: {
  rating: string | null;
  explainerUrl: string;
}) {
  // Not suspended: the scale arriving late shows the level's id for a moment, not a blank form.
  const levels = useQuery(ratingLevelsQueryOptions()).data;
  const level = levels?.find((candidate) => candidate.id === rating);
  return (
    <Text size="2">
      {rating ? (
        <>
          Rated <Text weight="bold">{level ? ratingLevelName(level) : rating}</Text> ·{' '}
        </>
      ) : null}
      <Link href={explainerUrl} target="_blank" rel="noopener noreferrer">
        Read the explainer <ExternalLinkIcon aria-hidden className="sl-inline-icon" />
        <VisuallyHidden>(opens in a new tab)</VisuallyHidden>
      </Link>
    </Text>
  );
}

/**
 * Earlier claims like the one being typed, so a reporter sees the desk has met it before.
 * Asks nothing below 12 characters; a request whose text has moved on is aborted.
 */
export function SimilarClaimsPanel({ text }: { text: string }) {
  const headingId = useId();
  const typed = text.trim();
  const settled = useDebouncedValue(typed, SIMILAR_CLAIMS_DEBOUNCE_MS);
  const similar = useSimilarClaims(settled);
  // Too short now hides the list at once, without waiting for the pause.
  const asking =
    typed.length >= SIMILAR_TEXT_MIN_LENGTH && settled.length >= SIMILAR_TEXT_MIN_LENGTH;
  const claims = asking && !similar.error ? (similar.data ?? []) : [];
  const status = !asking
    ? ''
    : similar.error
      ? `Similar claims could not be looked up: ${errorMessage(similar.error)}`
      : similar.data === undefined
        ? 'Looking for similar claims…'
        : claims.length === 0
          ? 'No similar claims on the desk.'
          : `${claims.length} similar ${claimsWord(claims.length)} on the desk.`;

  return (
    <Flex direction="column" gap="2">
      <Text size="2" color={similar.error ? 'red' : 'gray'} role="status" aria-live="polite">
        {status}
      </Text>
      {claims.length > 0 ? (
        <Card size="2" asChild>
          <section aria-labelledby={headingId}>
            <Flex direction="column" gap="3">
              <Flex direction="column" gap="1">
                <Heading as="h3" size="3" id={headingId}>
                  Already on the desk?
                </Heading>
                <Text size="2" color="gray">
                  Earlier claims close to this one. If it is the same claim, add an appearance there
                  instead of filing it again.
                </Text>
              </Flex>
              <ul className="sl-card-list">
                {claims.map((claim) => (
                  <li key={claim.id}>
                    <Flex direction="column" gap="1" align="start">
                      <AppLink
                        to={paths.app.claim.getHref(claim.id)}
                        target="_blank"
                        rel="noopener"
                        weight="bold"
                        className="sl-break"
                      >
                        {claim.summary} <ExternalLinkIcon aria-hidden className="sl-inline-icon" />
                        <VisuallyHidden>(opens in a new tab)</VisuallyHidden>
                      </AppLink>
                      <Flex gap="2" align="center" wrap="wrap">
                        <ClaimStatusBadge status={claim.status} />
                        <Text size="1" color="gray">
                          {claim.claimantName} · filed{' '}
                          <DateTime value={claim.filedAt} show="date" />
                        </Text>
                      </Flex>
                      {claim.explainerUrl ? (
                        <PublishedVerdict rating={claim.rating} explainerUrl={claim.explainerUrl} />
                      ) : null}
                    </Flex>
                  </li>
                ))}
              </ul>
            </Flex>
          </section>
        </Card>
      ) : null}
    </Flex>
  );
}
