import { CalcInputError } from '../errors/calc-input-error.js';
import { convertQuantity } from '../units/convert-quantity.js';
import {
  type ChoiceInputSpec,
  type Distribution,
  type InputSpec,
  type LinesInputSpec,
  type NamedSeries,
  type NormalisedRange,
  type NumberInputSpec,
  type SeriesInputSpec,
  type SeriesListInputSpec,
  type SeriesPoint,
  type TextInputSpec,
} from './types.js';

/** A number input given as a range, with its central (median) value. */
export interface RangedInput {
  readonly spec: NumberInputSpec;
  readonly range: NormalisedRange;
  readonly centre: number;
}

/** Inputs checked, converted to declared units and completed with defaults. */
export interface NormalisedCall {
  /** Values the formulas receive (a ranged input holds its median). */
  readonly values: Readonly<Record<string, unknown>>;
  /** Values recorded in the result (a ranged input holds its range). */
  readonly recorded: Readonly<Record<string, unknown>>;
  /** Names of the inputs the caller gave. */
  readonly provided: ReadonlySet<string>;
  /** The inputs given as ranges. */
  readonly ranged: readonly RangedInput[];
}

const distributions: readonly Distribution[] = ['uniform', 'normal', 'lognormal'];

function isPlainObject(value: unknown): value is Readonly<Record<string, unknown>> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function describeRange(spec: NumberInputSpec): string {
  const unit = spec.unit === '' ? '' : ` ${spec.unit}`;
  return `${spec.name} must be between ${spec.min} and ${spec.max}${unit}`;
}

function checkNumber(value: number, spec: NumberInputSpec, where: string): void {
  if (!Number.isFinite(value)) {
    throw new CalcInputError(spec.name, `${spec.name} must be a finite number`, where);
  }
  if (value < spec.min || value > spec.max) {
    throw new CalcInputError(spec.name, describeRange(spec), where);
  }
  if (spec.integer === true && !Number.isInteger(value)) {
    throw new CalcInputError(
      spec.name,
      `${spec.name} must be a whole number from ${spec.min} to ${spec.max}`,
      where,
    );
  }
}

function readFiniteField(
  container: Readonly<Record<string, unknown>>,
  key: string,
  spec: NumberInputSpec,
  where: string,
): number {
  const value = container[key];
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcInputError(spec.name, `${spec.name}.${key} must be a finite number`, where);
  }
  return value;
}

function readUnit(
  container: Readonly<Record<string, unknown>>,
  spec: NumberInputSpec,
  where: string,
): string {
  const unit = container.unit;
  if (unit === undefined) return spec.unit;
  if (typeof unit !== 'string') {
    throw new CalcInputError(spec.name, `${spec.name}.unit must be a string`, where);
  }
  return unit;
}

function convert(value: number, unit: string, spec: NumberInputSpec, where: string): number {
  return convertQuantity(value, unit, {
    field: spec.name,
    where,
    declaredUnit: spec.unit,
    temperatureDifference: spec.temperatureDifference === true,
  });
}

// The 95th percentile of the standard normal distribution, Φ⁻¹(0.95); the tests check it
// against jstat's normal quantile.
const standardNormal95 = 1.6448536269514722;

function medianOfRange(range: NormalisedRange): number {
  return range.distribution === 'lognormal'
    ? Math.sqrt(range.low * range.high)
    : (range.low + range.high) / 2;
}

function normaliseNumber(
  raw: unknown,
  spec: NumberInputSpec,
  where: string,
): { value: number; range?: NormalisedRange } {
  if (typeof raw === 'number') {
    checkNumber(raw, spec, where);
    return { value: raw };
  }
  if (!isPlainObject(raw)) {
    throw new CalcInputError(
      spec.name,
      `${spec.name} must be a number, { value, unit } or { low, high }`,
      where,
    );
  }
  const unit = readUnit(raw, spec, where);
  if ('value' in raw) {
    if ('low' in raw || 'high' in raw) {
      throw new CalcInputError(
        spec.name,
        `${spec.name} must be either { value, unit } or { low, high }, not both`,
        where,
      );
    }
    const value = convert(readFiniteField(raw, 'value', spec, where), unit, spec, where);
    checkNumber(value, spec, where);
    return { value };
  }
  if ('low' in raw || 'high' in raw) {
    if (spec.allowRange === false) {
      throw new CalcInputError(spec.name, `${spec.name} cannot be a range`, where);
    }
    const low = convert(readFiniteField(raw, 'low', spec, where), unit, spec, where);
    const high = convert(readFiniteField(raw, 'high', spec, where), unit, spec, where);
    checkNumber(low, spec, where);
    checkNumber(high, spec, where);
    if (low > high) {
      throw new CalcInputError(spec.name, `${spec.name} range must have low at most high`, where);
    }
    const distributionValue = raw.distribution ?? 'uniform';
    const distribution = distributions.find((candidate) => candidate === distributionValue);
    if (distribution === undefined) {
      throw new CalcInputError(
        spec.name,
        `${spec.name}.distribution must be one of ${distributions.join(', ')}`,
        where,
      );
    }
    if (spec.integer === true && distribution !== 'uniform') {
      throw new CalcInputError(
        spec.name,
        `${spec.name} is a whole number: its range can only be uniform`,
        where,
      );
    }
    if (distribution === 'lognormal' && low <= 0) {
      throw new CalcInputError(
        spec.name,
        `${spec.name} range must be above 0 for a lognormal distribution`,
        where,
      );
    }
    const range: NormalisedRange = { low, high, distribution };
    const centre = spec.integer === true ? Math.round(medianOfRange(range)) : medianOfRange(range);
    return { value: centre, range };
  }
  throw new CalcInputError(
    spec.name,
    `${spec.name} must be a number, { value, unit } or { low, high }`,
    where,
  );
}

function normaliseChoice(raw: unknown, spec: ChoiceInputSpec, where: string): string {
  const choice = spec.choices.find((option) => option.value === raw);
  if (choice === undefined) {
    throw new CalcInputError(
      spec.name,
      `${spec.name} must be one of ${spec.choices.map((option) => option.value).join(', ')}`,
      where,
    );
  }
  return choice.value;
}

function normaliseText(raw: unknown, spec: TextInputSpec, where: string): string {
  if (typeof raw !== 'string') {
    throw new CalcInputError(spec.name, `${spec.name} must be a string`, where);
  }
  if (raw.length > spec.maxLength) {
    throw new CalcInputError(
      spec.name,
      `${spec.name} must be at most ${spec.maxLength} characters`,
      where,
    );
  }
  return raw.trim();
}

function normalisePoints(
  raw: unknown,
  field: string,
  label: string,
  minPoints: number,
  maxPoints: number,
  where: string,
): SeriesPoint[] {
  if (!Array.isArray(raw)) {
    throw new CalcInputError(field, `${label} must be an array of { t, y } points`, where);
  }
  if (raw.length === 0) {
    throw new CalcInputError(field, `${label} must not be empty`, where);
  }
  if (raw.length < minPoints) {
    throw new CalcInputError(
      field,
      `${label} needs at least ${minPoints} points (has ${raw.length})`,
      where,
    );
  }
  if (raw.length > maxPoints) {
    throw new CalcInputError(field, `${label} may have at most ${maxPoints} points`, where);
  }
  const points: SeriesPoint[] = new Array<SeriesPoint>(raw.length);
  let sorted = true;
  for (let index = 0; index < raw.length; index += 1) {
    const point: unknown = raw[index];
    if (!isPlainObject(point)) {
      throw new CalcInputError(field, `${label}[${index}] must be a { t, y } point`, where);
    }
    const { t, y } = point;
    if (typeof t !== 'number' || !Number.isFinite(t)) {
      throw new CalcInputError(field, `${label}[${index}].t must be a finite number`, where);
    }
    if (typeof y !== 'number' || !Number.isFinite(y)) {
      throw new CalcInputError(field, `${label}[${index}].y must be a finite number`, where);
    }
    points[index] = { t, y };
    if (index > 0 && t < (points[index - 1]?.t ?? Number.NEGATIVE_INFINITY)) sorted = false;
  }
  if (!sorted) points.sort((first, second) => first.t - second.t);
  for (let index = 1; index < points.length; index += 1) {
    if (points[index]?.t === points[index - 1]?.t) {
      throw new CalcInputError(
        field,
        `${label} has two points at t = ${points[index]?.t}: times must be distinct`,
        where,
      );
    }
  }
  return points;
}

function normaliseSeries(raw: unknown, spec: SeriesInputSpec, where: string): SeriesPoint[] {
  return normalisePoints(raw, spec.name, spec.name, spec.minPoints, spec.maxPoints, where);
}

function normaliseSeriesList(
  raw: unknown,
  spec: SeriesListInputSpec,
  where: string,
): NamedSeries[] {
  if (!Array.isArray(raw)) {
    throw new CalcInputError(
      spec.name,
      `${spec.name} must be an array of { name, points } series`,
      where,
    );
  }
  if (raw.length < spec.minSeries) {
    throw new CalcInputError(
      spec.name,
      `${spec.name} needs at least ${spec.minSeries} series (has ${raw.length})`,
      where,
    );
  }
  if (raw.length > spec.maxSeries) {
    throw new CalcInputError(
      spec.name,
      `${spec.name} may have at most ${spec.maxSeries} series`,
      where,
    );
  }
  const names = new Set<string>();
  return raw.map((entry: unknown, index): NamedSeries => {
    if (!isPlainObject(entry)) {
      throw new CalcInputError(
        spec.name,
        `${spec.name}[${index}] must be a { name, points } series`,
        where,
      );
    }
    const name = typeof entry.name === 'string' ? entry.name.trim() : '';
    if (name === '') {
      throw new CalcInputError(
        spec.name,
        `${spec.name}[${index}].name must be a non-empty string`,
        where,
      );
    }
    if (names.has(name)) {
      throw new CalcInputError(
        spec.name,
        `${spec.name} has two series named "${name}": names must be distinct`,
        where,
      );
    }
    names.add(name);
    const points = normalisePoints(
      entry.points,
      spec.name,
      `${spec.name} "${name}"`,
      spec.minPoints,
      spec.maxPoints,
      where,
    );
    return { name, points };
  });
}

function normaliseLines(raw: unknown, spec: LinesInputSpec, where: string): string[] {
  const lines = typeof raw === 'string' ? raw.split(/\r?\n/) : raw;
  if (!Array.isArray(lines) || lines.some((line) => typeof line !== 'string')) {
    throw new CalcInputError(spec.name, `${spec.name} must be an array of strings`, where);
  }
  const strings = lines as string[];
  if (strings.every((line) => line.trim() === '')) {
    throw new CalcInputError(spec.name, `${spec.name} must have at least one line`, where);
  }
  if (strings.length > spec.maxLines) {
    throw new CalcInputError(
      spec.name,
      `${spec.name} may have at most ${spec.maxLines} lines`,
      where,
    );
  }
  const tooLong = strings.findIndex((line) => line.length > spec.maxLineLength);
  if (tooLong >= 0) {
    throw new CalcInputError(
      spec.name,
      `${spec.name}[${tooLong}] must be at most ${spec.maxLineLength} characters`,
      where,
    );
  }
  return strings;
}

/**
 * Checks a caller's inputs against a calculator's declarations, converts numbers to the
 * declared units and fills in defaults. Unknown input names are refused, so that a typo
 * never passes silently.
 *
 * @param specs the calculator's input declarations
 * @param inputs what the caller passed (`undefined` for all defaults)
 * @param where the calculator id, for errors
 * @returns values for the formulas, values for the record, and the ranges given
 * @throws {CalcInputError} for the first input that breaks a rule
 */
export function normaliseInputs(
  specs: readonly InputSpec[],
  inputs: unknown,
  where: string,
): NormalisedCall {
  if (inputs !== undefined && !isPlainObject(inputs)) {
    throw new CalcInputError('inputs', 'inputs must be an object of named inputs', where);
  }
  const given: Readonly<Record<string, unknown>> = inputs ?? {};
  for (const name of Object.keys(given)) {
    if (!specs.some((spec) => spec.name === name)) {
      throw new CalcInputError(
        name,
        `${name} is not an input of ${where} (inputs: ${specs.map((spec) => spec.name).join(', ')})`,
        where,
      );
    }
  }

  const values: Record<string, unknown> = {};
  const recorded: Record<string, unknown> = {};
  const provided = new Set<string>();
  const ranged: RangedInput[] = [];

  for (const spec of specs) {
    const raw = given[spec.name];
    if (raw === undefined || raw === null) {
      if (spec.kind === 'series' || spec.kind === 'seriesList') {
        throw new CalcInputError(spec.name, `${spec.name} is required`, where);
      }
      if (spec.default !== null) {
        const defaultValue: unknown = spec.kind === 'lines' ? [...spec.default] : spec.default;
        values[spec.name] = defaultValue;
        recorded[spec.name] = defaultValue;
      }
      continue;
    }
    provided.add(spec.name);
    switch (spec.kind) {
      case 'number': {
        const { value, range } = normaliseNumber(raw, spec, where);
        values[spec.name] = value;
        recorded[spec.name] = range ?? value;
        if (range !== undefined) ranged.push({ spec, range, centre: value });
        break;
      }
      case 'choice':
        values[spec.name] = recorded[spec.name] = normaliseChoice(raw, spec, where);
        break;
      case 'text':
        values[spec.name] = recorded[spec.name] = normaliseText(raw, spec, where);
        break;
      case 'series':
        values[spec.name] = recorded[spec.name] = normaliseSeries(raw, spec, where);
        break;
      case 'seriesList':
        values[spec.name] = recorded[spec.name] = normaliseSeriesList(raw, spec, where);
        break;
      case 'lines':
        values[spec.name] = recorded[spec.name] = normaliseLines(raw, spec, where);
        break;
    }
  }
  return { values, recorded, provided, ranged };
}

/**
 * Draws one value of a ranged input: uniform over [low, high] (whole numbers for integer
 * inputs), or normal / lognormal with low and high as 5th and 95th percentiles, redrawn
 * when a draw falls outside the input's allowed range.
 *
 * @param input the ranged input
 * @param uniform a uniform source in [0, 1)
 * @param normal a standard normal source
 * @returns one sample, in the declared unit
 */
export function sampleRangedInput(
  input: RangedInput,
  uniform: () => number,
  normal: () => number,
): number {
  const { low, high, distribution } = input.range;
  const { spec } = input;
  if (distribution === 'uniform') {
    if (spec.integer === true)
      return Math.min(high, low + Math.floor(uniform() * (high - low + 1)));
    return low + uniform() * (high - low);
  }
  const logarithmic = distribution === 'lognormal';
  const lowEnd = logarithmic ? Math.log(low) : low;
  const highEnd = logarithmic ? Math.log(high) : high;
  const centre = (lowEnd + highEnd) / 2;
  const spread = (highEnd - lowEnd) / (2 * standardNormal95);
  // Truncate to the allowed range by redrawing; low and high lie inside it, so at least
  // 90 % of draws are accepted and the loop ends quickly.
  for (let attempt = 0; attempt < 1000; attempt += 1) {
    const draw = centre + spread * normal();
    const value = logarithmic ? Math.exp(draw) : draw;
    if (value >= spec.min && value <= spec.max) return value;
  }
  return Math.min(spec.max, Math.max(spec.min, logarithmic ? Math.exp(centre) : centre));
}

export { standardNormal95 };
