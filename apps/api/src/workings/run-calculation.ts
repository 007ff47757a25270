import {
  calculators,
  isCalcInputError,
  runCalculator,
  type AnyCalculatorResult,
} from '@skyledger/calc';
import { type DatasetSeriesRef } from '@skyledger/contracts';
import { type EntityManager } from 'typeorm';
import { ApiError } from '../common/errors/api-error';
import { seriesOfDataset } from '../datasets/dataset-series';

export interface Calculation {
  result: AnyCalculatorResult;
  datasetRefs: Record<string, DatasetSeriesRef[]> | null;
}

const isDatasetRef = (value: unknown): value is DatasetSeriesRef =>
  typeof value === 'object' && value !== null && 'dataset' in value;

/**
 * Runs a calculator on the server, from inputs only, with the library's own Monte Carlo
 * sample count and seed (the desk's live results use the same, so a band reads alike in
 * both): series given as `{ dataset, column }` are read from the desk's datasets first. The library's refusals become 422s naming the
 * input (`inputs.<name>`) and the rule it broke.
 */
export async function runCalculation(
  /** Where datasets are read from; null where they may not be (the public run route). */
  manager: EntityManager | null,
  calculatorId: string,
  rawInputs: Record<string, unknown>,
): Promise<Calculation> {
  const calculator = calculators.find((candidate) => candidate.id === calculatorId);
  if (!calculator) {
    throw ApiError.unprocessable(`There is no calculator "${calculatorId}"`, {
      calculatorId: 'unknownCalculator',
    });
  }
  const inputs: Record<string, unknown> = { ...rawInputs };
  const datasetRefs: Record<string, DatasetSeriesRef[]> = {};
  for (const spec of calculator.inputs) {
    const value = inputs[spec.name];
    const refs = (Array.isArray(value) ? value : [value]).filter(isDatasetRef);
    if (refs.length > 0 && !manager) {
      throw ApiError.unprocessable('Datasets can be read only from the desk', {
        [`inputs.${spec.name}`]: 'datasetNotAllowed',
      });
    }
    if (spec.kind === 'series' && isDatasetRef(value) && manager) {
      datasetRefs[spec.name] = [value];
      inputs[spec.name] = (await seriesOfDataset(manager, value, `inputs.${spec.name}`)).points;
    }
    if (spec.kind === 'seriesList' && Array.isArray(value) && refs.length > 0 && manager) {
      datasetRefs[spec.name] = refs;
      inputs[spec.name] = await Promise.all(
        value.map((item, index) =>
          isDatasetRef(item)
            ? seriesOfDataset(manager, item, `inputs.${spec.name}.${index}`)
            : item,
        ),
      );
    }
  }
  try {
    const result = runCalculator(calculatorId, inputs);
    return { result, datasetRefs: Object.keys(datasetRefs).length ? datasetRefs : null };
  } catch (error) {
    if (!isCalcInputError(error)) throw error;
    throw ApiError.unprocessable(error.rule, { [`inputs.${error.field}`]: error.rule });
  }
}
