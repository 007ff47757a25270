import { type WorkingView } from '@skyledger/contracts';
import { type ClaimPartKind } from '../claims/claim-part-kind';
import { claimRoles } from '../claims/claim-policy';
import { assertNotInVerdict } from '../verdicts/verdict-references';
import { applyCalculation } from './apply-calculation';
import { Working } from './entities/working.entity';
import { runCalculation } from './run-calculation';
import { toWorkingView } from './working-view';

export const workingKind: ClaimPartKind<Working, WorkingView> = {
  entity: Working,
  name: 'working',
  addRoles: claimRoles.research,
  toView: toWorkingView,
  summarise: (working) => ({
    calculatorId: working.calculatorId,
    libraryVersion: working.libraryVersion,
    note: working.note,
  }),
  async beforeSave(manager, _claim, working) {
    // A new working is computed here, from its inputs alone; an edit changes only its note.
    if (working.id) return;
    applyCalculation(working, await runCalculation(manager, working.calculatorId, working.inputs));
  },
  beforeRemove: (manager, claim, working) =>
    assertNotInVerdict(manager, claim.id, { kind: 'working', id: working.id }),
};
