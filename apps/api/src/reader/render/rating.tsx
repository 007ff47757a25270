import { type ReaderRating } from '@skyledger/contracts';
import { formatDay, formatMoment, ratingPosition } from './format.js';
import { readerPaths } from './page.js';

/**
 * An instant in a `<time>` element carrying its exact value: the day only with `day`,
 * else the time with its zone named (and its IANA id with `zoneId`).
 */
export function Moment({
  at,
  timeZone,
  day = false,
  zoneId = false,
}: {
  at: string;
  timeZone: string;
  day?: boolean;
  zoneId?: boolean;
}) {
  return (
    <time dateTime={at}>{day ? formatDay(at, timeZone) : formatMoment(at, timeZone, zoneId)}</time>
  );
}

/** What the rating's number means, so "5 of 5" is never read the wrong way round. */
export function scaleNote(rating: ReaderRating): string {
  return `on our scale, where ${rating.bestRating} means the evidence supports the claim and ${rating.worstRating} means it contradicts it`;
}

/** The rating in words with its place on the scale: the first thing an explainer says. */
export function Verdict({
  rating,
  bottomLine,
  retracted,
}: {
  rating: ReaderRating | null;
  bottomLine: string;
  retracted: boolean;
}) {
  const position = rating ? ratingPosition(rating) : null;
  return (
    <div className="verdict">
      <p className="rating">
        <span className="small">{retracted ? 'Our rating, now withdrawn' : 'Our rating'}</span>
        <strong>{rating ? rating.label : 'Not rated'}</strong>
        {rating && position ? (
          <span className="small">
            {position} {scaleNote(rating)}.{' '}
          </span>
        ) : rating ? (
          <span className="small">An outcome, not a rating on our scale. </span>
        ) : null}
        <a className="small" href={`${readerPaths.methodology}#ratings`}>
          What our ratings mean
        </a>
      </p>
      {rating?.description ? <p className="small">{rating.description}</p> : null}
      <p className="bottom-line">
        <strong>The bottom line: </strong>
        {bottomLine}
      </p>
    </div>
  );
}
