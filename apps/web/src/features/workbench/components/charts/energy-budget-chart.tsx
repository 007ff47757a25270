import type { CalculatorResult } from '@skyledger/calc';
import { BandBarChart, type BandBar } from '@/components/charts/band-bar-chart';
import { seriesColors } from '@/components/charts/chart-style';
import { ChartFigure } from '@/components/ui/chart-figure';
import { quantityText } from '@/features/workings/format-values';
import { barOf, outputText } from '../results/format-output';
import { bandColumns, bandNote, bandRow } from '@/components/charts/band-table';
import { centralInput } from './central-input';

/** Sunlight in, reflected and absorbed, and the infrared out that balances it. */
export function EnergyBudgetChart({ result }: { result: CalculatorResult<'energy-balance'> }) {
  const { absorbedFlux, effectiveTemperature } = result.outputs;
  const arriving = (centralInput(result.inputs.solarIrradiance) ?? 0) / 4;
  const reflected = arriving - absorbedFlux.value;
  const bars: BandBar[] = [
    { label: 'Sunlight arriving', value: arriving, color: seriesColors.faint },
    { label: 'Reflected', value: reflected, color: seriesColors.faint },
    { label: 'Absorbed', ...barOf(absorbedFlux), color: seriesColors.sunlight },
    { label: 'Infrared out', ...barOf(absorbedFlux), color: seriesColors.infrared },
  ];
  const unit = 'W/m^2';
  return (
    <ChartFigure
      title="Energy budget, in and out (W/m², averaged over the globe)"
      summary={
        `Of ${quantityText(arriving, unit)} of sunlight arriving on average, ` +
        `${quantityText(reflected, unit)} is reflected and ${outputText(absorbedFlux)} absorbed. ` +
        `In balance the planet sends the same out as infrared, which it does at an effective temperature of ${outputText(effectiveTemperature)}.` +
        (absorbedFlux.band ? bandNote : '')
      }
      chart={<BandBarChart bars={bars} unit="W/m²" />}
      table={{
        columns: ['Flow', ...bandColumns('W/m²', absorbedFlux.band !== undefined)],
        rows: bars.map((bar) => bandRow(bar, absorbedFlux.band !== undefined)),
      }}
    />
  );
}
