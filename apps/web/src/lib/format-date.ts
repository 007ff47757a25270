const dateFormat = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
});

const dateTimeFormats = new Map<string, Intl.DateTimeFormat>();

function dateTimeFormat(timeZone: string | undefined): Intl.DateTimeFormat {
  const key = timeZone ?? '';
  let format = dateTimeFormats.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', {
      day: 'numeric',
      month: 'short',
      year: 'numeric',
      hour: '2-digit',
      minute: '2-digit',
      timeZone,
      timeZoneName: 'short',
    });
    dateTimeFormats.set(key, format);
  }
  return format;
}

/** "12 Jan 2026" */
export function formatDate(iso: string): string {
  return dateFormat.format(new Date(iso));
}

/** "12 Jan 2026" for a calendar date (`YYYY-MM-DD`), the same wherever it is read. */
export function formatCalendarDate(date: string): string {
  return dateFormat.format(new Date(`${date}T12:00:00Z`));
}

/**
 * "8 Mar 2026, 10:00 GMT": in the given zone, or in the desk's own (the browser's), always
 * with the zone named so nobody guesses whose clock it was.
 */
export function formatDateTime(iso: string, timeZone?: string): string {
  return dateTimeFormat(timeZone).format(new Date(iso));
}
