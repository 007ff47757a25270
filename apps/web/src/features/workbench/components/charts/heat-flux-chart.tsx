import { formatNumber, type CalculatorResult } from '@skyledger/calc';
import { seriesColors } from '@/components/charts/chart-style';
import { FluxComparisonFigure } from '@/components/charts/flux-comparison-figure';
import { quantityText } from '@/features/workings/format-values';
import { barOf, outputText } from '../results/format-output';
import { centralInput } from './central-input';

/** A heat flow as a global mean flux, set against the reference flux. */
export function HeatFluxChart({ result }: { result: CalculatorResult<'heat-flux-compare'> }) {
  const { flux, ratioToReference } = result.outputs;
  const reference = centralInput(result.inputs.referenceFlux) ?? 0;
  const ratio = ratioToReference.band?.p50 ?? ratioToReference.value;
  return (
    <FluxComparisonFigure
      title="Heat flow against the reference flux (W/m²)"
      summary={
        `The heat flow amounts to ${outputText(flux)} over the whole globe, ` +
        `${formatNumber(ratio, 3)} times the reference of ${quantityText(reference, 'W/m^2')}` +
        (ratio > 0 && ratio < 1 ? ` (about 1/${formatNumber(1 / ratio, 2)} of it).` : '.')
      }
      bars={[
        { label: 'Heat flow', ...barOf(flux), color: seriesColors.infrared },
        { label: 'Reference', value: reference, color: seriesColors.reference },
      ]}
      unit="W/m²"
    />
  );
}
