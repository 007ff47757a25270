import { type WorkingOutput, type WorkingStep, type WorkingView } from '@skyledger/contracts';
import { toPersonRef } from '../common/views/person-ref';
import { type Working } from './entities/working.entity';

/** Needs `createdBy` loaded. */
export function toWorkingView(working: Working): WorkingView {
  return {
    id: working.id,
    calculatorId: working.calculatorId,
    libraryVersion: working.libraryVersion,
    inputs: working.inputs,
    datasetRefs: working.datasetRefs,
    outputs: working.outputs as Record<string, WorkingOutput>,
    steps: working.steps as WorkingStep[],
    cautions: working.cautions,
    monteCarlo: working.monteCarlo as WorkingView['monteCarlo'],
    note: working.note,
    ranBy: toPersonRef(working.createdBy),
    ranAt: working.createdAt.toISOString(),
    checkedAt: working.checkedAt?.toISOString() ?? null,
    version: working.version,
  };
}
