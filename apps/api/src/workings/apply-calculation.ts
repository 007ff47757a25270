import { type Calculation } from './run-calculation';
import { type Working } from './entities/working.entity';

/** Writes a server run into a working: every computed field, from the library's result. */
export function applyCalculation(working: Working, { result, datasetRefs }: Calculation): void {
  working.calculatorId = result.calculatorId;
  working.libraryVersion = result.libraryVersion;
  working.inputs = result.inputs as Record<string, unknown>;
  working.datasetRefs = datasetRefs;
  working.outputs = result.outputs as Record<string, unknown>;
  working.steps = [...result.steps];
  working.cautions = [...result.cautions];
  working.monteCarlo = (result.monteCarlo as Record<string, unknown> | undefined) ?? null;
  working.checkedAt = new Date();
}
