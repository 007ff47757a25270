import { type ReaderExplainer, type ReaderSite } from '@skyledger/contracts';

/**
 * The schema.org ClaimReview of an explainer, as one JSON-LD object. Its values are
 * the page's own: the claim as said, the rating in words and number on the desk's scale
 * (the highest number holds up best), the dates, and after an update the note.
 * @see https://schema.org/ClaimReview
 */
export function claimReviewJsonLd(
  site: ReaderSite,
  explainer: ReaderExplainer,
): Record<string, unknown> {
  const organisation = { '@type': 'Organization', name: site.organisation, url: site.origin };
  const appearances = explainer.appearances.map((appearance) => {
    const url = appearance.captureUrl ?? appearance.url;
    return {
      '@type': 'CreativeWork',
      ...(url ? { url } : {}),
      datePublished: appearance.seenAt,
    };
  });
  const first = explainer.appearances.find((a) => a.isFirstKnown) ?? explainer.appearances[0];
  const rating = explainer.rating;
  return {
    '@context': 'https://schema.org',
    '@type': 'ClaimReview',
    url: explainer.versionUrl,
    claimReviewed: explainer.claim.text,
    datePublished: explainer.firstPublishedAt,
    ...(explainer.modifiedAt ? { dateModified: explainer.modifiedAt } : {}),
    author: organisation,
    reviewRating: {
      '@type': 'Rating',
      alternateName: rating?.label ?? 'Not rated',
      ...(rating?.number !== null && rating?.number !== undefined
        ? {
            ratingValue: rating.number,
            bestRating: rating.bestRating,
            worstRating: rating.worstRating,
          }
        : {}),
      ratingExplanation: explainer.bottomLine,
    },
    itemReviewed: {
      '@type': 'Claim',
      author: {
        '@type': explainer.claimant.kind === 'organisation' ? 'Organization' : 'Person',
        name: explainer.claimant.displayName,
      },
      ...(first
        ? {
            datePublished: first.seenAt,
            firstAppearance: appearances[explainer.appearances.indexOf(first)],
          }
        : {}),
      appearance: appearances,
    },
    ...(explainer.updateNotes.length
      ? {
          correction: explainer.updateNotes.map((note) => ({
            '@type': 'CorrectionComment',
            text: `${note.kindLabel}: ${note.text}`,
            datePublished: note.at,
          })),
        }
      : {}),
  };
}

/** What a share card says: the verdict first, never the claim alone. */
export function shareMeta(explainer: ReaderExplainer) {
  const verdict = explainer.retracted ? 'Retracted' : (explainer.rating?.label ?? 'Checked');
  return {
    title: `${verdict}: ${explainer.claim.summary}`,
    description: explainer.bottomLine,
    url: explainer.versionUrl,
  };
}
