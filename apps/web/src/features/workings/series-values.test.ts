import { describe, expect, it } from 'vitest';
import { seriesShown } from './series-values';

const points = [
  { t: 1979, y: 0.1 },
  { t: 2025, y: 0.9 },
];
const ref = (column: string) => ({ dataset: '9a1d3c55-7e20-4b1a-8c3f-5e0000000001', column });

describe('seriesShown', () => {
  it('gives a series its span and the dataset column it was read from', () => {
    expect(seriesShown(points, [ref('anomaly_k')])).toEqual([
      { name: null, span: '2 points, 1979 to 2025', ref: ref('anomaly_k') },
    ]);
  });

  it('pairs a list of series with their dataset columns when every one was read from one', () => {
    const list = [
      { name: 'Night', points },
      { name: 'Day', points: points.slice(0, 1) },
    ];
    expect(seriesShown(list, [ref('night'), ref('day')])).toEqual([
      { name: 'Night', span: '2 points, 1979 to 2025', ref: ref('night') },
      { name: 'Day', span: '1 point, at 1979', ref: ref('day') },
    ]);
    // One typed in and one read from a dataset: which is which cannot be told.
    expect(seriesShown(list, [ref('night')]).map((series) => series.ref)).toEqual([null, null]);
  });
});
