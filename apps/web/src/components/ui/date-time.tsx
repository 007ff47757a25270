import { useDeskTimeZone } from '@/lib/desk-time-zone';
import { formatCalendarDate, formatDate, formatDateTime } from '@/lib/format-date';

interface DateTimeProps {
  /** An instant (`2026-11-12T19:42:00Z`), or a calendar date (`2026-11-12`) with `calendar`. */
  value: string;
  /** `time`: the date and time with the zone named; `date`: the day only. */
  show?: 'time' | 'date';
  /** The zone to read the instant in; the desk's own by default. */
  timeZone?: string;
  calendar?: boolean;
}

/** A date or instant as the desk writes it, in a `<time>` element with the exact value. */
export function DateTime({ value, show = 'time', timeZone, calendar = false }: DateTimeProps) {
  const deskTimeZone = useDeskTimeZone();
  const zone = timeZone ?? deskTimeZone;
  const text = calendar
    ? formatCalendarDate(value)
    : show === 'date'
      ? formatDate(value, zone)
      : formatDateTime(value, zone);
  return <time dateTime={value}>{text}</time>;
}
