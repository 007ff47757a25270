export { libraryVersion } from './version.js';
export {
  calculators,
  isCalculatorId,
  runCalculator,
  type AnyCalculatorResult,
  type CalculatorInputs,
  type CalculatorResult,
} from './run-calculator.js';
export { calculatorIds, type CalculatorId } from './calculators/registry.js';
export { CalcInputError, isCalcInputError } from './errors/calc-input-error.js';
export { constants } from './constants/constants-table.js';
export { type ConstantUncertainty, type PhysicalConstant } from './constants/physical-constant.js';
export { references, type Reference, type ReferenceKey } from './references/bibliography.js';
export { renderReferencesMarkdown } from './references/render-references-markdown.js';
export { type StartYearRow } from './calculators/trend.js';
export { type PairDifferenceRow, type SeriesTrendRow } from './calculators/pattern-compare.js';
export { type WorksheetLineResult } from './worksheet/evaluate-worksheet.js';
export { convertQuantity, type ConversionTarget } from './units/convert-quantity.js';
export { displayUnit } from './units/display-unit.js';
export { formatNumber, formatQuantity } from './format/format-number.js';
export type {
  AcceptedInputs,
  Band,
  CalculatorInfo,
  CalculatorOutput,
  CalculatorOutputInfo,
  ChoiceInputSpec,
  ChoiceOption,
  Distribution,
  InputKind,
  InputSpec,
  LinesInputSpec,
  ListBand,
  ListOutput,
  MonteCarloInfo,
  NamedSeries,
  NormalisedRange,
  NumberInputSpec,
  NumberInputValue,
  NumberOutput,
  OutputKind,
  QuantityValue,
  RangeValue,
  RunOptions,
  SeriesInputSpec,
  SeriesListInputSpec,
  SeriesPoint,
  Step,
  TableColumn,
  TableOutput,
  TextInputSpec,
  TextOutput,
} from './calculator/types.js';
