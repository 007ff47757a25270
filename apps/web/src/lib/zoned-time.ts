/**
 * Wall-clock times in a named time zone, turned into instants with their offset, without
 * a date library: the browser's Intl database knows every zone's offset at any instant.
 */

const partsFormats = new Map<string, Intl.DateTimeFormat>();

function partsFormat(timeZone: string): Intl.DateTimeFormat {
  let format = partsFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
    });
    partsFormats.set(timeZone, format);
  }
  return format;
}

/** The wall-clock fields of an instant in a zone, as milliseconds of a UTC date. */
function wallClockMs(instantMs: number, timeZone: string): number {
  const parts: Record<string, number> = {};
  for (const part of partsFormat(timeZone).formatToParts(new Date(instantMs))) {
    if (part.type !== 'literal') parts[part.type] = Number(part.value);
  }
  return Date.UTC(
    parts.year ?? 1970,
    (parts.month ?? 1) - 1,
    parts.day ?? 1,
    parts.hour ?? 0,
    parts.minute ?? 0,
    parts.second ?? 0,
  );
}

/** The zone's offset from UTC at an instant, in whole minutes (east positive). */
export function offsetMinutesAt(instantMs: number, timeZone: string): number {
  const wholeSecond = Math.floor(instantMs / 1000) * 1000;
  return Math.round((wallClockMs(wholeSecond, timeZone) - wholeSecond) / 60_000);
}

function formatOffset(minutes: number): string {
  if (minutes === 0) return 'Z';
  const sign = minutes > 0 ? '+' : '-';
  const absolute = Math.abs(minutes);
  const hours = String(Math.floor(absolute / 60)).padStart(2, '0');
  return `${sign}${hours}:${String(absolute % 60).padStart(2, '0')}`;
}

const localPattern = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2}))?$/;

/** True for the value of an `<input type="datetime-local">`: `2026-11-30T18:05`. */
export function isLocalDateTime(value: string): boolean {
  const match = localPattern.exec(value);
  if (!match) return false;
  const [, year, month, day, hour, minute] = match.map(Number) as number[];
  const date = new Date(Date.UTC(year!, month! - 1, day!, hour!, minute!));
  return date.getUTCMonth() === month! - 1 && date.getUTCDate() === day! && hour! < 24;
}

/**
 * The instant a wall-clock time names in a zone, written with that zone's offset:
 * `zonedInstant('2026-11-30T18:05', 'Europe/Berlin')` → `'2026-11-30T18:05:00+01:00'`.
 * A time skipped by a clock change (02:30 on a spring-forward night) moves forward by
 * the gap, as clocks do; a repeated one takes the earlier of its two instants.
 */
export function zonedInstant(local: string, timeZone: string): string {
  const match = localPattern.exec(local);
  if (!match || !isLocalDateTime(local)) throw new Error(`Not a local date and time: ${local}`);
  const [, year, month, day, hour, minute, second] = match.map((part) => Number(part ?? 0));
  const wall = Date.UTC(year!, month! - 1, day!, hour!, minute!, second!);
  // The zone's offsets half a day either side; they differ only around a clock change.
  const offsets = [
    offsetMinutesAt(wall - 43_200_000, timeZone),
    offsetMinutesAt(wall + 43_200_000, timeZone),
  ];
  const readingAsAsked = offsets
    .map((offset) => wall - offset * 60_000)
    .filter((candidate) => wallClockMs(candidate, timeZone) === wall);
  // In a gap no instant reads as asked: the offset before the gap moves it forward.
  const instant =
    readingAsAsked.length > 0 ? Math.min(...readingAsAsked) : wall - offsets[0]! * 60_000;
  const offset = offsetMinutesAt(instant, timeZone);
  const shownWall = new Date(instant + offset * 60_000).toISOString().slice(0, 19);
  return `${shownWall}${formatOffset(offset)}`;
}

/** The browser's own zone, e.g. `Europe/London`; UTC when it cannot tell. */
export function browserTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
}

/** Every zone the browser knows, with UTC first and the given zone surely included. */
export function timeZoneNames(include: string): string[] {
  const known =
    typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  const names = new Set(['UTC', ...known]);
  names.add(include);
  return [...names];
}
