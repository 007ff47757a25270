import { describe, expect, it } from 'vitest';
import { parseSeriesText } from './parse-series-text';

describe('parseSeriesText', () => {
  it('reads t,y lines with any of the usual separators, skipping a header, notes and blanks', () => {
    expect(
      parseSeriesText('year,anomaly\n1979,0.1\n\n# a note\n1980;−0.2\n1981\t0.3\n1982  0.4'),
    ).toEqual({
      ok: true,
      points: [
        { t: 1979, y: 0.1 },
        { t: 1980, y: -0.2 },
        { t: 1981, y: 0.3 },
        { t: 1982, y: 0.4 },
      ],
    });
  });

  it('names the first line that is not a time and a value', () => {
    expect(parseSeriesText('1979,0.1\n1980,warm\n1981,0.3')).toEqual({
      ok: false,
      error: 'Line 2 (“1980,warm”) is not a time and a value: write t,y, e.g. 1998,0.42',
    });
    // A line of words after the first point is no header.
    expect(parseSeriesText('1979,0.1\nyear,anomaly')).toMatchObject({ ok: false });
    expect(parseSeriesText('1979,0.1,7')).toMatchObject({ ok: false });
  });
});
