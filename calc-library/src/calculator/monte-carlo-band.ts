import { CalcInputError, isCalcInputError } from '../errors/calc-input-error.js';
import { createSeededRandom } from '../random/seeded-random.js';
import { standardNormalDeviate } from '../random/standard-normal-deviate.js';
import { percentileOfSorted } from '../statistics/percentile-of-sorted.js';
import { type RangedInput, sampleRangedInput } from './normalise-inputs.js';
import { type Band, type ListBand, type RawOutputs } from './types.js';

/** Bands of the numeric outputs, by output name. */
export type OutputBands = Readonly<Record<string, Band | ListBand>>;

function bandOf(samples: Float64Array): Band {
  samples.sort();
  return {
    p5: percentileOfSorted(samples, 0.05),
    p50: percentileOfSorted(samples, 0.5),
    p95: percentileOfSorted(samples, 0.95),
  };
}

/**
 * Propagates input ranges to output bands: draws every ranged input independently from
 * its distribution, evaluates the calculator for each draw, and takes the 5th, 50th and
 * 95th percentiles of every number and list output. The seed fixes the draws, so the same
 * seed gives the same band.
 *
 * @param evaluate the calculator's formulas
 * @param values the central input values
 * @param ranged the inputs given as ranges
 * @param central the central outputs (they fix which outputs get a band, and list lengths)
 * @param samples number of draws
 * @param seed seed of the generator
 * @returns a band per numeric output
 * @throws {CalcInputError} when part of a range leads outside a formula's validity
 */
export function monteCarloBands(
  evaluate: (values: Readonly<Record<string, unknown>>) => RawOutputs,
  values: Readonly<Record<string, unknown>>,
  ranged: readonly RangedInput[],
  central: RawOutputs,
  samples: number,
  seed: number,
): OutputBands {
  const uniform = createSeededRandom(seed);
  const normal = (): number => standardNormalDeviate(uniform);
  const scalarNames: string[] = [];
  const listNames: string[] = [];
  for (const [name, value] of Object.entries(central)) {
    if (typeof value === 'number') scalarNames.push(name);
    else if (Array.isArray(value) && value.every((entry) => typeof entry === 'number')) {
      listNames.push(name);
    }
  }
  const scalarSamples = scalarNames.map(() => new Float64Array(samples));
  const listSamples = listNames.map((name) => {
    const length = (central[name] as readonly number[]).length;
    return Array.from({ length }, () => new Float64Array(samples));
  });

  const sampleValues: Record<string, unknown> = { ...values };
  for (let sample = 0; sample < samples; sample += 1) {
    for (const input of ranged) {
      sampleValues[input.spec.name] = sampleRangedInput(input, uniform, normal);
    }
    let outputs: RawOutputs;
    try {
      outputs = evaluate(sampleValues);
    } catch (error) {
      if (isCalcInputError(error)) {
        throw new CalcInputError(
          error.field,
          `${error.rule} (for part of the given range, e.g. ${ranged
            .map((input) => `${input.spec.name} = ${String(sampleValues[input.spec.name])}`)
            .join(', ')})`,
          error.where,
        );
      }
      throw error;
    }
    // Plain loops: this runs once per sample.
    for (let index = 0; index < scalarNames.length; index += 1) {
      const target = scalarSamples[index];
      if (target !== undefined) target[sample] = outputs[scalarNames[index] ?? ''] as number;
    }
    for (let index = 0; index < listNames.length; index += 1) {
      const list = outputs[listNames[index] ?? ''] as readonly number[];
      const targets = listSamples[index] ?? [];
      for (let element = 0; element < targets.length; element += 1) {
        const target = targets[element];
        if (target !== undefined) target[sample] = list[element] ?? Number.NaN;
      }
    }
  }

  const bands: Record<string, Band | ListBand> = {};
  scalarNames.forEach((name, index) => {
    const target = scalarSamples[index];
    if (target !== undefined) bands[name] = bandOf(target);
  });
  listNames.forEach((name, index) => {
    const elementBands = (listSamples[index] ?? []).map(bandOf);
    bands[name] = {
      p5: elementBands.map((band) => band.p5),
      p50: elementBands.map((band) => band.p50),
      p95: elementBands.map((band) => band.p95),
    };
  });
  return bands;
}
