import { runCalculator } from '@skyledger/calc';
import { type ClaimRow } from './desk-rows';
import { type SeededRandom } from './random';
import { calculations, type CalculationKey } from './vocabulary';

/** A working as the generator writes it; JSON columns hold their text. */
export interface WorkingRow {
  id: string;
  claimId: string;
  createdById: string;
  createdAt: Date;
  updatedAt: Date;
  version: number;
  calculatorId: string;
  libraryVersion: string;
  inputs: string;
  datasetRefs: null;
  outputs: string;
  steps: string;
  cautions: string;
  monteCarlo: string | null;
  note: string;
  checkedAt: Date;
}

/** One run of a calculation, in the form a working stores it. */
export type StoredRun = Pick<
  WorkingRow,
  | 'calculatorId'
  | 'libraryVersion'
  | 'inputs'
  | 'outputs'
  | 'steps'
  | 'cautions'
  | 'monteCarlo'
  | 'note'
>;

const runs = new Map<CalculationKey, StoredRun>();

/**
 * The calculation run by @skyledger/calc, as the API's applyCalculation stores a server
 * run: once per calculation, on first use, and shared by every working made of it.
 */
export function calculationRun(key: CalculationKey): StoredRun {
  const known = runs.get(key);
  if (known) return known;
  const { calculatorId, inputs, note } = calculations[key];
  const result = runCalculator(calculatorId as string, inputs);
  const run: StoredRun = {
    calculatorId: result.calculatorId,
    libraryVersion: result.libraryVersion,
    inputs: JSON.stringify(result.inputs),
    outputs: JSON.stringify(result.outputs),
    steps: JSON.stringify(result.steps),
    cautions: JSON.stringify(result.cautions),
    monteCarlo: result.monteCarlo ? JSON.stringify(result.monteCarlo) : null,
    note,
  };
  runs.set(key, run);
  return run;
}

/** The instant `fraction` of the way from a claim's filing to its last change. */
export function duringClaim(claim: Pick<ClaimRow, 'createdAt' | 'updatedAt'>, fraction: number) {
  const start = claim.createdAt.getTime();
  return new Date(start + Math.floor((claim.updatedAt.getTime() - start) * fraction));
}

/** The workings of a researched claim, saved by its researcher early in the research. */
export function workingRows(
  random: SeededRandom,
  claim: ClaimRow,
  keys: readonly CalculationKey[],
  researcherId: string,
): WorkingRow[] {
  return keys.map((key, index) => {
    const at = duringClaim(claim, 0.05 + 0.15 * index + 0.1 * random.next());
    return {
      id: random.uuid(),
      claimId: claim.id,
      createdById: researcherId,
      createdAt: at,
      updatedAt: at,
      version: 1,
      ...calculationRun(key),
      datasetRefs: null,
      checkedAt: at,
    };
  });
}
