import { describe, expect, it } from 'vitest';
import { isLocalDateTime, offsetMinutesAt, zonedInstant } from './zoned-time';

describe('zonedInstant', () => {
  // Offsets from the IANA tz database as shipped with the runtime's ICU.
  it.each([
    ['2026-11-30T18:05', 'Europe/Berlin', '2026-11-30T18:05:00+01:00'],
    ['2026-07-01T12:00', 'Europe/London', '2026-07-01T12:00:00+01:00'],
    ['2026-01-15T09:30', 'America/New_York', '2026-01-15T09:30:00-05:00'],
    ['2026-03-02T08:00', 'Asia/Kolkata', '2026-03-02T08:00:00+05:30'],
    ['2026-03-02T08:00', 'UTC', '2026-03-02T08:00:00Z'],
    ['2026-06-10T23:45', 'Pacific/Auckland', '2026-06-10T23:45:00+12:00'],
  ])('reads %s in %s as %s', (local, zone, expected) => {
    expect(zonedInstant(local, zone)).toBe(expected);
  });

  it('names the same instant as the offset says', () => {
    const instant = zonedInstant('2026-10-25T00:30', 'Europe/London');
    expect(new Date(instant).toISOString()).toBe('2026-10-24T23:30:00.000Z');
  });

  it('moves a time skipped by the spring clock change forward by the gap', () => {
    // London skips 01:00–02:00 on 29 March 2026.
    expect(zonedInstant('2026-03-29T01:30', 'Europe/London')).toBe('2026-03-29T02:30:00+01:00');
  });

  it('takes the earlier of the two instants of a repeated autumn hour', () => {
    // London's 01:00–02:00 happens twice on 25 October 2026, first in summer time.
    expect(zonedInstant('2026-10-25T01:30', 'Europe/London')).toBe('2026-10-25T01:30:00+01:00');
  });

  it('refuses what is not a local date and time', () => {
    expect(() => zonedInstant('2026-02-30T10:00', 'UTC')).toThrow(/Not a local date/);
    expect(isLocalDateTime('2026-11-30 18:05')).toBe(false);
    expect(isLocalDateTime('2026-11-30T18:05')).toBe(true);
  });
});

describe('offsetMinutesAt', () => {
  it('gives east-positive minutes', () => {
    expect(offsetMinutesAt(Date.UTC(2026, 0, 1), 'Asia/Kathmandu')).toBe(345);
    expect(offsetMinutesAt(Date.UTC(2026, 0, 1), 'America/St_Johns')).toBe(-210);
  });
});
