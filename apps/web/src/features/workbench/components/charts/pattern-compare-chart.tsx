import { formatNumber, type CalculatorResult } from '@skyledger/calc';
import { BandBarChart, type BandBar } from '@/components/charts/band-bar-chart';
import { seriesColors } from '@/components/charts/chart-style';
import { ChartFigure } from '@/components/ui/chart-figure';

/** The trend of each series side by side, each with its 95 % interval. */
export function PatternCompareChart({ result }: { result: CalculatorResult<'pattern-compare'> }) {
  const { seriesTrends, summary } = result.outputs;
  const unit = seriesTrends.columns.find((column) => column.key === 'slopePerDecade')?.unit ?? '';
  const bars: BandBar[] = seriesTrends.value.map((row) => ({
    label: row.name,
    value: row.slopePerDecade,
    low: row.ciLow,
    high: row.ciHigh,
    color: row.slopePerDecade < 0 ? seriesColors.reference : seriesColors.result,
  }));
  return (
    <ChartFigure
      title={`Trends side by side (${unit})`}
      summary={`${summary.value} The lines on the bars span each trend’s 95 % interval.`}
      chart={
        <BandBarChart
          bars={bars}
          unit={unit}
          horizontal
          height={Math.max(260, 60 * bars.length + 60)}
        />
      }
      table={{
        columns: ['Series', `Trend (${unit})`, '95 % low', '95 % high'],
        rows: bars.map((bar) => [
          bar.label,
          formatNumber(bar.value),
          formatNumber(bar.low ?? Number.NaN),
          formatNumber(bar.high ?? Number.NaN),
        ]),
      }}
    />
  );
}
