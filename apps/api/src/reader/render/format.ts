import { displayUnit, formatQuantity } from '@skyledger/calc';
import { type ReaderRating, type ReaderSite } from '@skyledger/contracts';

const formats = new Map<string, Intl.DateTimeFormat>();

function formatFor(timeZone: string, withTime: boolean): Intl.DateTimeFormat {
  const key = `${timeZone}|${withTime}`;
  let format = formats.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', {
      day: 'numeric',
      month: 'long',
      year: 'numeric',
      timeZone,
      ...(withTime ? { hour: '2-digit', minute: '2-digit', timeZoneName: 'short' } : {}),
    });
    formats.set(key, format);
  }
  return format;
}

/** The zone reader pages show the desk's own dates in. */
export function siteTimeZone(site: ReaderSite): string {
  return site.timeZone ?? 'UTC';
}

/**
 * "4 March 2026 at 20:40 CET": an instant on the clock of `timeZone`, the zone always
 * named; with `zoneId`, also its IANA id ("… CET (Europe/Paris)"), for places whose short
 * zone name a reader may not know.
 */
export function formatMoment(iso: string, timeZone: string, zoneId = false): string {
  const text = formatFor(timeZone, true).format(new Date(iso));
  return zoneId && !text.endsWith(` ${timeZone}`) ? `${text} (${timeZone})` : text;
}

/** "4 March 2026": the day of an instant in `timeZone`. */
export function formatDay(iso: string, timeZone: string): string {
  return formatFor(timeZone, false).format(new Date(iso));
}

/** A value with its unit as readers write it: "254.6 K", "2.16 W/m²". */
export function quantityText(value: number, unit: string, significantDigits = 4): string {
  return formatQuantity(value, displayUnit(unit), significantDigits);
}

/** The highest number on the rating scale, whichever end is best. */
export function scaleTop(rating: ReaderRating): number {
  return Math.max(rating.bestRating, rating.worstRating);
}

/** "1 of 5": where a rating stands on the scale; null for an outcome that is not a rating. */
export function ratingPosition(rating: ReaderRating): string | null {
  return rating.isRating && rating.number !== null
    ? `${rating.number} of ${scaleTop(rating)}`
    : null;
}

/** Only web addresses and paths on this site become links; anything else stays text. */
export function isLinkable(url: string | null): url is string {
  return url !== null && (/^https?:\/\//i.test(url) || /^\/(?!\/)/.test(url));
}

/** https://doi.org/ link of a DOI, each path segment encoded. */
export function doiUrl(doi: string): string {
  return `https://doi.org/${doi.split('/').map(encodeURIComponent).join('/')}`;
}

/** The site's host name, for addresses such as claims@host. */
export function siteHost(site: ReaderSite): string {
  return new URL(site.origin).hostname;
}
