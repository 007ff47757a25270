const dayParts = { day: 'numeric', month: 'short', year: 'numeric' } as const;
const formats = new Map<string, Intl.DateTimeFormat>();

/** One formatter per kind and zone: building them is slow, and lists show hundreds. */
function cachedFormat(kind: 'date' | 'time', timeZone: string | undefined): Intl.DateTimeFormat {
  const key = `${kind} ${timeZone ?? ''}`;
  let format = formats.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', {
      ...dayParts,
      ...(kind === 'time' ? { hour: '2-digit', minute: '2-digit', timeZoneName: 'short' } : {}),
      timeZone,
    });
    formats.set(key, format);
  }
  return format;
}

/** "12 Jan 2026": the day an instant falls on in the given zone (the browser's if none). */
export function formatDate(iso: string, timeZone?: string): string {
  return cachedFormat('date', timeZone).format(new Date(iso));
}

/** "12 Jan 2026" for a calendar date (`YYYY-MM-DD`), the same wherever it is read. */
export function formatCalendarDate(date: string): string {
  return cachedFormat('date', 'UTC').format(new Date(`${date}T12:00:00Z`));
}

/**
 * "8 Mar 2026, 10:00 GMT": in the given zone (the browser's if none), always with the zone
 * named so nobody guesses whose clock it was.
 */
export function formatDateTime(iso: string, timeZone?: string): string {
  return cachedFormat('time', timeZone).format(new Date(iso));
}
