import { formatNumber, type CalculatorResult } from '@skyledger/calc';
import type { BandBar } from '@/components/charts/band-bar-chart';
import { seriesColors } from '@/components/charts/chart-style';
import { FluxComparisonFigure } from '@/components/charts/flux-comparison-figure';
import { quantityText } from '@/features/workings/format-values';
import { barOf, outputText } from '../results/format-output';
import { centralInput } from './central-input';

/** The forcing of a change of sunlight (and of albedo) beside greenhouse forcing. */
export function SolarChangeChart({ result }: { result: CalculatorResult<'solar-change'> }) {
  const { irradianceForcing, albedoForcing, totalForcing, ratioToReference } = result.outputs;
  const reference = centralInput(result.inputs.referenceForcing) ?? 0;
  // A cause that was not changed draws no bar; the total stands for both when only one was.
  const parts: BandBar[] = [
    { label: 'Sun’s change', ...barOf(irradianceForcing), color: seriesColors.sunlight },
    { label: 'Albedo change', ...barOf(albedoForcing), color: seriesColors.faint },
  ].filter((bar) => bar.value !== 0);
  const bars: BandBar[] = [
    ...(parts.length > 1 ? parts : []),
    { label: 'Absorbed sunlight', ...barOf(totalForcing), color: seriesColors.sunlight },
    { label: 'Greenhouse forcing', value: reference, color: seriesColors.infrared },
  ];
  const ratio = ratioToReference.band?.p50 ?? ratioToReference.value;
  return (
    <FluxComparisonFigure
      title="Change of absorbed sunlight against greenhouse forcing (W/m²)"
      summary={
        `The change of absorbed sunlight is ${outputText(totalForcing)}, ` +
        `${formatNumber(ratio, 3)} times the greenhouse forcing of ${quantityText(reference, 'W/m^2')}.`
      }
      bars={bars}
      unit="W/m²"
    />
  );
}
