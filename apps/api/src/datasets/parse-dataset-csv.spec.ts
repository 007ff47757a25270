import { parseDatasetCsv } from './parse-dataset-csv';
import { parseDecimalYear } from './parse-time';

const selection = {
  timeColumn: 'year',
  valueColumns: [{ column: 'anomaly', unit: 'K', label: 'Anomaly' }],
};

describe('parseDecimalYear', () => {
  it('reads years, months and days as decimal years (mid-period)', () => {
    expect(parseDecimalYear('1998')).toBe(1998);
    expect(parseDecimalYear(' 1998.25 ')).toBe(1998.25);
    // Middle of January: 0.5/12 of a year in.
    expect(parseDecimalYear('2000-01')).toBeCloseTo(2000 + 0.5 / 12, 12);
    // 29 February 2000 is day 60 of a 366-day year.
    expect(parseDecimalYear('2000-02-29')).toBeCloseTo(2000 + 59.5 / 366, 12);
    // 31 December 2001 is day 365 of a 365-day year.
    expect(parseDecimalYear('2001-12-31')).toBeCloseTo(2001 + 364.5 / 365, 12);
  });

  it('refuses what is not a time', () => {
    for (const cell of ['', 'n/a', '1998-13', '2001-02-29', '98/07/01', '1e3']) {
      expect(parseDecimalYear(cell)).toBeNull();
    }
  });
});

describe('parseDatasetCsv', () => {
  it('types the chosen columns and sorts by time', () => {
    const parsed = parseDatasetCsv('year,anomaly,source\n2001,0.5,x\n2000,0.4,y\n', selection);
    expect(parsed).toEqual({
      ok: true,
      columns: [{ key: 'anomaly', label: 'Anomaly', unit: 'K' }],
      rows: [
        [2000, 0.4],
        [2001, 0.5],
      ],
    });
  });

  it('reports every bad row by its line and returns no rows', () => {
    const text = 'year,anomaly\n2000,0.4\n\n2001,warm\n2002,\n2000,0.6\nsoon,0.1\n';
    const parsed = parseDatasetCsv(text, selection);
    expect(parsed).toEqual({
      ok: false,
      problems: [
        { line: 4, column: 'anomaly', problem: '"warm" is not a number' },
        { line: 5, column: 'anomaly', problem: 'is empty' },
        { line: 6, column: 'year', problem: 'repeats the time of line 2' },
        {
          line: 7,
          column: 'year',
          problem: '"soon" is not a year (1998, 1998.5) or a date (1998-07, 1998-07-15)',
        },
      ],
    });
  });

  it('names a chosen column that the file does not have', () => {
    const parsed = parseDatasetCsv('when,anomaly\n2000,1\n', selection);
    expect(parsed).toEqual({
      ok: false,
      problems: [{ line: 1, column: 'year', problem: 'is not a column of the file' }],
    });
  });
});
