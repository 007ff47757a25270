import {
  type SignoffDecisionView,
  type VerdictConflictView,
  type VerdictVersionView,
} from '@skyledger/contracts';
import { citedSourceIds, embeddedWorkingIds } from '@skyledger/explainer';
import { toPersonRef } from '../common/views/person-ref';
import { type SignoffDecisionRecord } from './entities/signoff-decision.entity';
import { type VerdictConflict } from './entities/verdict-conflict.entity';
import { type VerdictVersion } from './entities/verdict-version.entity';

/** Needs `decidedBy` loaded. */
export function toSignoffDecisionView(record: SignoffDecisionRecord): SignoffDecisionView {
  return {
    id: record.id,
    versionId: record.versionId,
    decision: record.decision,
    notes: record.notes,
    by: toPersonRef(record.decidedBy),
    at: record.at.toISOString(),
    checklist: record.checklist,
  };
}

/** Needs `createdBy`, `lastEditedBy` and `claimant` loaded. */
export function toVerdictVersionView(
  version: VerdictVersion,
  decisions: SignoffDecisionRecord[] = [],
): VerdictVersionView {
  return {
    id: version.id,
    number: version.number,
    state: version.state,
    ratingId: version.ratingId,
    bottomLine: version.bottomLine,
    body: version.body as VerdictVersionView['body'],
    bodyHtml: version.bodyHtml,
    primarySourceId: version.primarySourceId,
    citedSourceIds: citedSourceIds(version.body),
    embeddedWorkingIds: embeddedWorkingIds(version.body),
    draftedBy: toPersonRef(version.createdBy),
    lastEditedBy: toPersonRef(version.lastEditedBy),
    createdAt: version.createdAt.toISOString(),
    updatedAt: version.updatedAt.toISOString(),
    submittedAt: version.submittedAt?.toISOString() ?? null,
    claimAsCleared:
      version.claimText !== null && version.claimSummary !== null && version.claimant
        ? {
            text: version.claimText,
            summary: version.claimSummary,
            claimantName: version.claimant.name,
          }
        : null,
    decisions: decisions
      .filter((decision) => decision.versionId === version.id)
      .map(toSignoffDecisionView),
    version: version.version,
  };
}

/** Needs `savedBy` loaded. */
export function toVerdictConflictView(conflict: VerdictConflict): VerdictConflictView {
  return {
    id: conflict.id,
    versionId: conflict.versionId,
    savedBy: toPersonRef(conflict.savedBy),
    at: conflict.at.toISOString(),
    ratingId: conflict.ratingId,
    bottomLine: conflict.bottomLine,
    body: conflict.body as VerdictConflictView['body'],
  };
}
