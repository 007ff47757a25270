import { type ReferenceKey } from '../references/bibliography.js';

// ---------------------------------------------------------------------------------------
// Input declarations: what a form generator reads to render a calculator.
// ---------------------------------------------------------------------------------------

/** One point of a time series: t as a decimal year, y in the series' unit. */
export interface SeriesPoint {
  readonly t: number;
  readonly y: number;
}

/** A named time series, for comparisons. */
export interface NamedSeries {
  readonly name: string;
  readonly points: readonly SeriesPoint[];
}

/**
 * How a range input is sampled in a Monte Carlo band. `uniform` (the default) spreads
 * samples evenly between low and high; for `normal` and `lognormal` the low and high values
 * are the 5th and 95th percentiles (an IPCC "very likely" range).
 */
export type Distribution = 'uniform' | 'normal' | 'lognormal';

/** One choice of an enumerated input. */
export interface ChoiceOption {
  readonly value: string;
  readonly label: string;
}

interface InputSpecBase {
  /** The input's name in `runCalculator` inputs. */
  readonly name: string;
  /** Short label for a form. */
  readonly label: string;
  /** One or two sentences for a form's help text. */
  readonly help: string;
  /** Bibliography key of the source of the default, where it has one. */
  readonly source?: ReferenceKey;
}

/** A number in a declared unit; accepts a number, `{ value, unit }` or a range. */
export interface NumberInputSpec extends InputSpecBase {
  readonly kind: 'number';
  /** Declared unit (mathjs notation, or one of the library's own units such as `ppm`). */
  readonly unit: string;
  /** Value used when the input is not given; `null` when the input is optional. */
  readonly default: number | null;
  /** Smallest allowed value, in the declared unit (inclusive). */
  readonly min: number;
  /** Largest allowed value, in the declared unit (inclusive). */
  readonly max: number;
  /** True for whole numbers (e.g. a count of layers). */
  readonly integer?: boolean;
  /** True for a temperature difference: then 3 °C converts to 3 K, not 276.15 K. */
  readonly temperatureDifference?: boolean;
  /** False when a range makes no sense for this input; ranges are allowed otherwise. */
  readonly allowRange?: boolean;
}

/** One of a fixed set of strings. */
export interface ChoiceInputSpec extends InputSpecBase {
  readonly kind: 'choice';
  readonly unit: '';
  readonly default: string;
  readonly choices: readonly ChoiceOption[];
}

/** A short free text (e.g. the unit of a series, used to label results). */
export interface TextInputSpec extends InputSpecBase {
  readonly kind: 'text';
  readonly unit: '';
  readonly default: string;
  readonly maxLength: number;
}

/** A time series: an array of `{ t, y }`. */
export interface SeriesInputSpec extends InputSpecBase {
  readonly kind: 'series';
  readonly unit: '';
  readonly default: null;
  readonly minPoints: number;
  readonly maxPoints: number;
}

/** Several named time series: an array of `{ name, points }`. */
export interface SeriesListInputSpec extends InputSpecBase {
  readonly kind: 'seriesList';
  readonly unit: '';
  readonly default: null;
  readonly minSeries: number;
  readonly maxSeries: number;
  readonly minPoints: number;
  readonly maxPoints: number;
}

/** Lines of text (an array of strings, or one string with line breaks). */
export interface LinesInputSpec extends InputSpecBase {
  readonly kind: 'lines';
  readonly unit: '';
  readonly default: readonly string[];
  readonly maxLines: number;
  readonly maxLineLength: number;
}

/** Any input declaration; `kind` tells which. */
export type InputSpec =
  | NumberInputSpec
  | ChoiceInputSpec
  | TextInputSpec
  | SeriesInputSpec
  | SeriesListInputSpec
  | LinesInputSpec;

/** The kinds of input a form generator must render. */
export type InputKind = InputSpec['kind'];

// ---------------------------------------------------------------------------------------
// Input values: what callers pass, and what calculators receive.
// ---------------------------------------------------------------------------------------

/** A number with its unit, in any unit compatible with the declared one. */
export interface QuantityValue {
  readonly value: number;
  readonly unit: string;
}

/** A range of values, in the declared unit unless `unit` is given. */
export interface RangeValue {
  readonly low: number;
  readonly high: number;
  readonly unit?: string;
  readonly distribution?: Distribution;
}

/** What a number input accepts. */
export type NumberInputValue = number | QuantityValue | RangeValue;

/** A range as recorded in a result: in the declared unit, with its distribution. */
export interface NormalisedRange {
  readonly low: number;
  readonly high: number;
  readonly distribution: Distribution;
}

/** What a caller may pass for an input of this declaration. */
export type AcceptedValueOf<Spec extends InputSpec> = Spec extends NumberInputSpec
  ? NumberInputValue
  : Spec extends ChoiceInputSpec
    ? Spec['choices'][number]['value']
    : Spec extends TextInputSpec
      ? string
      : Spec extends SeriesInputSpec
        ? readonly SeriesPoint[]
        : Spec extends SeriesListInputSpec
          ? readonly NamedSeries[]
          : Spec extends LinesInputSpec
            ? readonly string[] | string
            : never;

/** What the calculator's formulas receive for an input of this declaration. */
export type InputValueOf<Spec extends InputSpec> = Spec extends NumberInputSpec
  ? Spec['default'] extends number
    ? number
    : number | undefined
  : Spec extends ChoiceInputSpec
    ? Spec['choices'][number]['value']
    : Spec extends TextInputSpec
      ? string
      : Spec extends SeriesInputSpec
        ? readonly SeriesPoint[]
        : Spec extends SeriesListInputSpec
          ? readonly NamedSeries[]
          : Spec extends LinesInputSpec
            ? readonly string[]
            : never;

/** How an input is recorded in a result (numbers in the declared unit). */
export type NormalisedValueOf<Spec extends InputSpec> = Spec extends NumberInputSpec
  ? number | NormalisedRange
  : InputValueOf<Spec>;

/** The inputs a calculator's formulas receive, by name. */
export type InputValues<Specs extends readonly InputSpec[]> = {
  readonly [Spec in Specs[number] as Spec['name']]: InputValueOf<Spec>;
};

/** The inputs a caller may pass, by name; all optional (missing ones take their defaults). */
export type AcceptedInputs<Specs extends readonly InputSpec[]> = {
  readonly [Spec in Specs[number] as Spec['name']]?: AcceptedValueOf<Spec>;
};

/** The inputs as recorded in a result, by name. */
export type NormalisedInputs<Specs extends readonly InputSpec[]> = {
  readonly [Spec in Specs[number] as Spec['name']]?: NormalisedValueOf<Spec>;
};

// ---------------------------------------------------------------------------------------
// Outputs.
// ---------------------------------------------------------------------------------------

/** 5th, 50th and 95th percentiles of an output over the Monte Carlo samples. */
export interface Band {
  readonly p5: number;
  readonly p50: number;
  readonly p95: number;
}

/** Percentiles of a list output, element by element. */
export interface ListBand {
  readonly p5: readonly number[];
  readonly p50: readonly number[];
  readonly p95: readonly number[];
}

/** A number with its unit; `band` when an input was a range. */
export interface NumberOutput {
  readonly kind: 'number';
  readonly value: number;
  readonly unit: string;
  readonly band?: Band;
}

/** A list of numbers in one unit (e.g. layer temperatures, top layer first). */
export interface ListOutput {
  readonly kind: 'list';
  readonly value: readonly number[];
  readonly unit: string;
  readonly band?: ListBand;
}

/** A paragraph of plain text (e.g. the expected warming pattern of a cause). */
export interface TextOutput {
  readonly kind: 'text';
  readonly value: string;
  readonly unit: '';
}

/** One column of a table output. */
export interface TableColumn {
  readonly key: string;
  readonly label: string;
  readonly unit: string;
}

/** Rows of structured values, with the columns that describe them. */
export interface TableOutput<Row extends object = object> {
  readonly kind: 'table';
  readonly value: readonly Row[];
  readonly unit: '';
  readonly columns: readonly TableColumn[];
}

/** Any output; `kind` tells which. */
export type CalculatorOutput = NumberOutput | ListOutput | TextOutput | TableOutput;

/** The kinds of output. */
export type OutputKind = CalculatorOutput['kind'];

/** The raw values a calculator's formulas return, by output name. */
export type RawOutputs = Readonly<
  Record<string, number | readonly number[] | string | readonly object[] | undefined>
>;

/** The output object for a raw value of type V. */
export type OutputFor<Value> = Value extends number
  ? NumberOutput
  : Value extends readonly number[]
    ? ListOutput
    : Value extends string
      ? TextOutput
      : Value extends readonly (infer Row extends object)[]
        ? TableOutput<Row>
        : never;

/** The outputs of a result, by name, typed from the calculator's raw outputs. */
export type ResultOutputs<Raw extends RawOutputs> = {
  readonly [Name in keyof Raw]: OutputFor<NonNullable<Raw[Name]>>;
};

interface OutputSpecBase {
  readonly label: string;
  /** Unit of the output; a part in parentheses such as `(series unit)` is filled in per run. */
  readonly unit: string;
  readonly help?: string;
}

/** Declaration of an output of kind `number`, `list` or `text`. */
export interface ScalarOutputSpec<Kind extends 'number' | 'list' | 'text'> extends OutputSpecBase {
  readonly kind: Kind;
}

/** Declaration of a table output. */
export interface TableOutputSpec extends OutputSpecBase {
  readonly kind: 'table';
  readonly columns: readonly TableColumn[];
}

/** The declaration an output of raw type V needs. */
export type OutputSpecFor<Value> = Value extends number
  ? ScalarOutputSpec<'number'>
  : Value extends readonly number[]
    ? ScalarOutputSpec<'list'>
    : Value extends string
      ? ScalarOutputSpec<'text'>
      : Value extends readonly object[]
        ? TableOutputSpec
        : never;

/** Output declarations of a calculator, one per raw output, in display order. */
export type OutputSpecs<Raw extends RawOutputs> = {
  readonly [Name in keyof Raw]-?: OutputSpecFor<NonNullable<Raw[Name]>>;
};

// ---------------------------------------------------------------------------------------
// Steps, metadata and results.
// ---------------------------------------------------------------------------------------

/** One step of the derivation a reader can follow. */
export interface Step {
  /** What the step computes, in words ("Absorbed sunlight"). */
  readonly text: string;
  /** The formula with the numbers put in ("S (1 − α) / 4 = 1361 × 0.7 / 4"). */
  readonly formula: string;
  /** The result with its unit ("238.2 W/m²"). */
  readonly result: string;
}

/** What a calculator's formulas know about the call besides the input values. */
export interface EvaluateContext {
  /** Names of the inputs the caller gave (the others took their defaults). */
  readonly provided: ReadonlySet<string>;
}

/** A calculator: its declarations and its formulas. */
export interface CalculatorDefinition<
  Id extends string,
  Specs extends readonly InputSpec[],
  Raw extends RawOutputs,
> {
  readonly id: Id;
  readonly title: string;
  readonly summary: string;
  readonly inputs: Specs;
  readonly outputs: OutputSpecs<Raw>;
  /** The limits of the model, in plain words. */
  readonly cautions: readonly string[];
  readonly references: readonly ReferenceKey[];
  /** Computes the outputs; called once for the result and once per Monte Carlo sample. */
  evaluate(values: InputValues<Specs>, context: EvaluateContext): Raw;
  /** Writes the derivation of the central result for readers. */
  explain(values: InputValues<Specs>, outputs: Raw, context: EvaluateContext): Step[];
  /** Fills in units that depend on the inputs (keys are the parenthesised parts of units). */
  unitPlaceholders?(values: InputValues<Specs>): Readonly<Record<string, string>>;
  /** Cautions that depend on the inputs or results. */
  extraCautions?(values: InputValues<Specs>, outputs: Raw): string[];
}

/** What `calculators` lists about an output. */
export interface CalculatorOutputInfo {
  readonly name: string;
  readonly kind: OutputKind;
  readonly label: string;
  readonly unit: string;
  readonly help?: string;
  readonly columns?: readonly TableColumn[];
}

/** What `calculators` lists about a calculator: everything a form needs, no functions. */
export interface CalculatorInfo {
  readonly id: string;
  readonly title: string;
  readonly summary: string;
  readonly inputs: readonly InputSpec[];
  readonly outputs: readonly CalculatorOutputInfo[];
  readonly cautions: readonly string[];
  readonly references: readonly ReferenceKey[];
}

/** Options of `runCalculator`. */
export interface RunOptions {
  /** Monte Carlo samples for a band (100–200 000), 10 000 unless given. */
  readonly samples?: number;
  /** Seed of the Monte Carlo sampler (0 to 2³² − 1); fixed unless given. */
  readonly seed?: number;
}

/** How the band of a result was made. */
export interface MonteCarloInfo {
  readonly samples: number;
  readonly seed: number;
  /** Inputs given as ranges. */
  readonly rangedInputs: readonly string[];
}

/** The result of one run of a calculator. */
export interface CalculatorResultOf<
  Id extends string,
  Specs extends readonly InputSpec[],
  Raw extends RawOutputs,
> {
  readonly calculatorId: Id;
  readonly libraryVersion: string;
  /** Every input used, given or default, in the declared units: enough to recompute. */
  readonly inputs: NormalisedInputs<Specs>;
  readonly outputs: ResultOutputs<Raw>;
  readonly steps: readonly Step[];
  readonly cautions: readonly string[];
  /** Present when an input was a range and outputs carry a band. */
  readonly monteCarlo?: MonteCarloInfo;
}
