import type { CalculatorResult } from '@skyledger/calc';
import { BandBarChart, type BandBar } from '@/components/charts/band-bar-chart';
import { seriesColors } from '@/components/charts/chart-style';
import { ChartFigure } from '@/components/ui/chart-figure';
import { quantityText } from '@/features/workings/format-values';
import { barOf } from '../results/format-output';
import { bandColumns, bandNote, bandRow } from '@/components/charts/band-table';

/** The forcing of each gas and of the three together. */
export function ForcingByGasChart({ result }: { result: CalculatorResult<'ghg-forcing'> }) {
  const { co2Forcing, ch4Forcing, n2oForcing, totalForcing, forcingKind } = result.outputs;
  const bars: BandBar[] = [
    { label: 'CO2', ...barOf(co2Forcing), color: seriesColors.infrared },
    { label: 'CH4', ...barOf(ch4Forcing), color: seriesColors.infrared },
    { label: 'N2O', ...barOf(n2oForcing), color: seriesColors.infrared },
    { label: 'Total', ...barOf(totalForcing), color: seriesColors.result },
  ];
  const banded = totalForcing.band !== undefined;
  return (
    <ChartFigure
      title={`Forcing by gas (W/m², ${forcingKind.value})`}
      summary={
        `${bars
          .slice(0, 3)
          .map((bar) => `${bar.label} ${quantityText(bar.value, 'W/m^2')}`)
          .join(', ')}; together ${quantityText(bars[3]?.value ?? 0, 'W/m^2')}.` +
        (banded ? bandNote : '')
      }
      chart={<BandBarChart bars={bars} unit="W/m²" />}
      table={{
        columns: ['Gas', ...bandColumns('W/m²', banded, 'Forcing')],
        rows: bars.map((bar) => bandRow(bar, banded)),
      }}
    />
  );
}
