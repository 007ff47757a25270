import type { AnyCalculatorResult } from '@skyledger/calc';
import { EnergyBudgetChart } from './energy-budget-chart';
import { ForcingByGasChart } from './forcing-by-gas-chart';
import { HeatFluxChart } from './heat-flux-chart';
import { LayerTemperaturesChart } from './layer-temperatures-chart';
import { PatternCompareChart } from './pattern-compare-chart';
import { SolarChangeChart } from './solar-change-chart';
import { StartYearChart } from './start-year-chart';
import { TrendChart } from './trend-chart';

/** Table outputs a chart already shows with its own data table. */
export const chartedTables: ReadonlySet<string> = new Set(['startYearSensitivity']);

/** The charts of a result, where a picture says more than the numbers; none otherwise. */
export function CalculatorCharts({ result }: { result: AnyCalculatorResult }) {
  switch (result.calculatorId) {
    case 'energy-balance':
      return <EnergyBudgetChart result={result} />;
    case 'layer-atmosphere':
      return <LayerTemperaturesChart result={result} />;
    case 'ghg-forcing':
      return <ForcingByGasChart result={result} />;
    case 'heat-flux-compare':
      return <HeatFluxChart result={result} />;
    case 'solar-change':
      return <SolarChangeChart result={result} />;
    case 'trend':
      return (
        <>
          <TrendChart result={result} />
          <StartYearChart result={result} />
        </>
      );
    case 'pattern-compare':
      return <PatternCompareChart result={result} />;
    default:
      return null;
  }
}
