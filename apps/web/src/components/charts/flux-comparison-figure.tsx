import { ChartFigure } from '@/components/ui/chart-figure';
import { BandBarChart, wantsLogScale, type BandBar } from './band-bar-chart';
import { bandColumns, bandNote, bandRow } from './band-table';

interface FluxComparisonFigureProps {
  title: string;
  /** What the comparison shows, in words (the scale and band are said here). */
  summary: string;
  /** The fluxes, the reference last. */
  bars: readonly BandBar[];
  /** The unit as readers write it. */
  unit: string;
}

/**
 * Fluxes set against a reference: on a log scale when they differ tenfold or more, so a
 * small flux is still seen beside a large one, and the text says so.
 */
export function FluxComparisonFigure({ title, summary, bars, unit }: FluxComparisonFigureProps) {
  const log = wantsLogScale(bars);
  const banded = bars.some((bar) => bar.low !== undefined);
  return (
    <ChartFigure
      title={title}
      summary={
        summary +
        (log
          ? ' The scale is logarithmic: each step up the axis is ten times the one below.'
          : '') +
        (banded ? bandNote : '')
      }
      chart={
        <BandBarChart
          bars={bars}
          unit={unit}
          log={log}
          horizontal
          height={Math.max(260, 60 * bars.length + 60)}
        />
      }
      table={{
        columns: ['Flux', ...bandColumns(unit, banded)],
        rows: bars.map((bar) => bandRow(bar, banded)),
      }}
    />
  );
}
