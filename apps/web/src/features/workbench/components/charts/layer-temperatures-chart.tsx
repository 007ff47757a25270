import type { CalculatorResult } from '@skyledger/calc';
import { BandBarChart, type BandBar } from '@/components/charts/band-bar-chart';
import { seriesColors } from '@/components/charts/chart-style';
import { ChartFigure } from '@/components/ui/chart-figure';
import { quantityText } from '@/features/workings/format-values';
import { barOf, outputText } from '../results/format-output';
import { bandColumns, bandNote, bandRow } from '@/components/charts/band-table';

/** The surface (level 0) and each layer up to the top (level N), against the emission temperature. */
export function LayerTemperaturesChart({
  result,
}: {
  result: CalculatorResult<'layer-atmosphere'>;
}) {
  const { surfaceTemperature, layerTemperatures, effectiveTemperature, greenhouseWarming } =
    result.outputs;
  const count = layerTemperatures.value.length;
  const band = layerTemperatures.band;
  // The library lists layers top first; the chart reads top to bottom, as the air stands.
  const layers: BandBar[] = layerTemperatures.value.map((temperature, index) => ({
    label: index === 0 ? `Layer ${count} (top)` : `Layer ${count - index}`,
    ...(band
      ? { value: band.p50[index] ?? temperature, low: band.p5[index], high: band.p95[index] }
      : { value: temperature }),
    color: seriesColors.infrared,
  }));
  const bars: BandBar[] = [
    ...layers,
    { label: 'Surface', ...barOf(surfaceTemperature), color: seriesColors.sunlight },
  ];
  const banded = surfaceTemperature.band !== undefined;
  const lowest = Math.min(...bars.map((bar) => bar.low ?? bar.value), effectiveTemperature.value);
  return (
    <ChartFigure
      title={`Temperature of the surface and ${count === 1 ? 'the layer' : `${count} layers`} (K)`}
      summary={
        `The surface stands at ${outputText(surfaceTemperature)}, ${quantityText(greenhouseWarming.value, 'K')} warmer than the ` +
        `${quantityText(effectiveTemperature.value, 'K')} at which the planet radiates to space (dashed line). ` +
        `${count === 1 ? 'The layer is' : 'The layers are, from the top down,'} at ${layers
          .map((layer) => quantityText(layer.value, 'K'))
          .join(', ')}.` +
        (banded ? bandNote : '')
      }
      chart={
        <BandBarChart
          bars={bars}
          unit="K"
          horizontal
          reference={{ value: effectiveTemperature.value, label: 'Tₑ' }}
          domain={[Math.max(0, Math.floor((lowest - 30) / 50) * 50), 'auto']}
          height={Math.max(260, 48 * bars.length + 60)}
        />
      }
      table={{
        columns: ['Level', ...bandColumns('K', banded, 'Temperature')],
        rows: bars.map((bar) => bandRow(bar, banded)),
      }}
    />
  );
}
