import { runCalculator } from '@skyledger/calc';
import { renderToStaticMarkup } from 'react-dom/server';
import { readerWorking, syntheticAnomalies } from '../explainer.fixture';
import { allElements, byTag, parseHtml, textOf } from '../html.fixture';
import { valueScale, wantsLogScale } from './chart-scale';
import { ChartSvg } from './chart-svg';
import { workingCharts, type WorkingChart } from './working-charts';

const chartsOf = (result: Parameters<typeof readerWorking>[1]) =>
  workingCharts(readerWorking('w', result, null));

const geometryAttribute = /^(x|y|x1|x2|y1|y2|cx|cy|width|height|d|points|viewBox)$/;

/** The drawing of a chart, parsed, with the values of its geometry attributes. */
function drawing(chart: WorkingChart) {
  const page = parseHtml(renderToStaticMarkup(<ChartSvg chart={chart} id="c" />));
  const svg = byTag(page.document, 'svg')[0]!;
  const geometry = allElements(svg).flatMap((element) =>
    element.attrs
      .filter((attribute) => geometryAttribute.test(attribute.name))
      .map((attribute) => attribute.value),
  );
  return { svg, geometry };
}

describe('wantsLogScale', () => {
  it('is true only for positive values spanning more than two orders of magnitude', () => {
    expect(wantsLogScale([0.01, 1])).toBe(false);
    expect(wantsLogScale([0.01, 1.01])).toBe(true);
    expect(wantsLogScale([-0.01, 5])).toBe(false);
    expect(wantsLogScale([0, 5])).toBe(false);
    expect(wantsLogScale([])).toBe(false);
  });
});

describe('valueScale', () => {
  it('puts round ticks over the data and maps its ends onto the pixels', () => {
    const scale = valueScale([0.0319, 0.0358], [0, 100]);
    expect(scale.ticks).toEqual([0.031, 0.032, 0.033, 0.034, 0.035, 0.036]);
    expect(scale.at(0.031)).toBeCloseTo(0);
    expect(scale.at(0.036)).toBeCloseTo(100);
  });

  it('starts bars at zero and, when tight, ends the axis at the data', () => {
    expect(valueScale([0.09, 2.72], [0, 100], { includeZero: true }).ticks).toEqual([
      0, 0.5, 1, 1.5, 2, 2.5, 3,
    ]);
    const years = valueScale([1979, 2021], [0, 100], { tight: true });
    expect(years.ticks).toEqual([1980, 1990, 2000, 2010, 2020]);
    expect(years.at(1979)).toBe(0);
    expect(years.at(2021)).toBe(100);
  });

  it('marks powers of ten on a log scale', () => {
    const scale = valueScale([0.0178, 2.72], [0, 300], { log: true });
    expect(scale.ticks).toEqual([0.01, 0.1, 1, 10]);
    expect(scale.floor).toBe(0.01);
    expect(scale.at(0.1)).toBeCloseTo(100);
  });
});

describe('workingCharts', () => {
  it('draws the energy balance’s bands as ranges, each output on its own axis', () => {
    const [chart, ...rest] = chartsOf(
      runCalculator('energy-balance', { albedo: { low: 0.28, high: 0.32 } }),
    );
    expect(rest).toEqual([]);
    expect(chart).toMatchObject({ kind: 'ranges', sharedAxis: false, log: false });
    if (chart?.kind !== 'ranges') throw new Error('expected ranges');
    expect(chart.rows.map((row) => [row.label, row.unit])).toEqual([
      ['Absorbed sunlight', 'W/m^2'],
      ['Effective temperature', 'K'],
    ]);
    expect(chart.summary).toMatch(/^Absorbed sunlight: 238\.\d W\/m² \(5th–95th percentile range/);
    expect(chart.table.columns).toEqual(['Result', '5th percentile', 'Median', '95th percentile']);
  });

  it('draws no chart for a working without bands, lists or series', () => {
    expect(chartsOf(runCalculator('energy-balance', {}))).toEqual([]);
  });

  it('sets a heat flow against its reference on a linear scale when they are within a hundredfold', () => {
    const [comparison] = chartsOf(runCalculator('heat-flux-compare', {}));
    expect(comparison).toMatchObject({ kind: 'bars', log: false });
    if (comparison?.kind !== 'bars') throw new Error('expected bars');
    // The reference is the calculator's default, 2.72 W/m² (AR6 total anthropogenic ERF, Forster et al. 2021).
    expect(comparison.rows[1]).toMatchObject({ label: 'Reference flux', reference: true });
    expect(comparison.rows[1]!.value).toBeCloseTo(2.72, 10);
  });

  it('uses a log scale when a solar change is more than a hundred times smaller than greenhouse forcing', () => {
    // ΔS = 0.1 W/m² gives 0.1 × (1 − 0.29)/4 ≈ 0.018 W/m², about 1/150 of 2.72 W/m².
    const [comparison] = chartsOf(runCalculator('solar-change', { irradianceChange: 0.1 }));
    expect(comparison).toMatchObject({
      kind: 'bars',
      log: true,
      title: 'Change of absorbed sunlight against the greenhouse forcing (W/m²)',
    });
    expect(comparison!.summary).toContain('The scale is logarithmic');
    const { svg } = drawing(comparison!);
    expect(byTag(svg, 'rect')).toHaveLength(2);
    expect(byTag(svg, 'text').map(textOf)).toEqual(
      expect.arrayContaining(['0.01', '0.1', '1', '10']),
    );
  });

  it('draws a list output (layer temperatures) as bars', () => {
    const charts = chartsOf(runCalculator('layer-atmosphere', { layers: 3 }));
    const bars = charts.find((chart) => chart.kind === 'bars');
    expect(bars).toMatchObject({ title: 'Layer temperatures, top layer first (K)' });
    if (bars?.kind !== 'bars') throw new Error('expected bars');
    expect(bars.rows.map((row) => row.label)).toEqual(['1', '2', '3']);
  });

  it('draws the trend’s start-year table as a line with its interval, and names it as shown', () => {
    const charts = chartsOf(
      runCalculator('trend', { series: syntheticAnomalies, seriesUnit: 'K' }),
    );
    const [line] = charts;
    expect(charts).toHaveLength(1);
    if (line?.kind !== 'line') throw new Error('expected a line');
    expect(line.tableOutput).toBe('startYearSensitivity');
    expect(line.xLabel).toBe('Start year');
    expect(line.unit).toBe('K/decade');
    expect(line.points[0]).toMatchObject({ x: 1979 });
    expect(line.points.every((point) => point.low! <= point.y && point.y <= point.high!)).toBe(
      true,
    );
    expect(line.table.columns).toEqual([
      'Start year',
      'Trend (K/decade)',
      '95 % low (K/decade)',
      '95 % high (K/decade)',
      'Points',
    ]);
    expect(line.summary).toMatch(/^Trend for each start year from 1979 to \d{4}: lowest/);
    const { svg } = drawing(line);
    expect(byTag(svg, 'polyline')).toHaveLength(1);
    expect(byTag(svg, 'polygon')).toHaveLength(1);
  });

  it('draws pattern-compare’s trends and differences as ranges on one axis each', () => {
    const series = (slope: number) =>
      syntheticAnomalies.map((point, index) => ({ t: point.t, y: point.y + slope * index }));
    const charts = chartsOf(
      runCalculator('pattern-compare', {
        series: [
          { name: 'night', points: series(0.01) },
          { name: 'day', points: series(0) },
        ],
        seriesUnit: 'K',
      }),
    );
    expect(charts.map((chart) => [chart.kind, chart.tableOutput])).toEqual([
      ['ranges', 'seriesTrends'],
      ['ranges', 'pairDifferences'],
    ]);
    const [trends, differences] = charts as Array<Extract<WorkingChart, { kind: 'ranges' }>>;
    expect(trends!.sharedAxis).toBe(true);
    expect(trends!.rows.map((row) => row.label)).toEqual(['night', 'day']);
    expect(differences!.rows.map((row) => row.label)).toEqual(['night − day']);
    // night gains 0.01 K a year more than day: 0.1 K/decade more (by construction).
    expect(differences!.rows[0]!.value).toBeCloseTo(0.1, 10);
  });

  it('draws every chart with finite coordinates and a text alternative', () => {
    const results = [
      runCalculator('energy-balance', { albedo: { low: 0.28, high: 0.32 } }),
      runCalculator('heat-flux-compare', { globalPower: { low: 44, high: 50, unit: 'TW' } }),
      runCalculator('solar-change', { irradianceChange: 0.1 }),
      runCalculator('layer-atmosphere', { layers: 2 }),
      runCalculator('trend', { series: syntheticAnomalies, seriesUnit: 'K' }),
    ];
    for (const chart of results.flatMap(chartsOf)) {
      const { svg, geometry } = drawing(chart);
      expect(geometry.length).toBeGreaterThan(0);
      expect(geometry.join(' ')).not.toMatch(/NaN|Infinity|undefined/);
      expect(textOf(byTag(svg, 'title')[0]!)).toBe(chart.summary);
    }
  });
});
