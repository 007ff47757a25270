import {
  checklistItem,
  legalReviewItem,
  reliabilityGradeLabels,
  replyChannelLabels,
  type ChecklistItem,
  type WorkingOutput,
} from '@skyledger/contracts';
import { isEmptyExplainer } from '@skyledger/explainer';
import { type EntityManager } from 'typeorm';
import { type Claim } from '../claims/entities/claim.entity';
import { ReplyAttempt } from '../reply-attempts/entities/reply-attempt.entity';
import { ClaimSource } from '../sources/entities/claim-source.entity';
import { User } from '../users/entities/user.entity';
import { Working } from '../workings/entities/working.entity';
import { runCalculation } from '../workings/run-calculation';
import { outputDifferences } from '../workings/workings.service';
import { type VerdictVersion } from './entities/verdict-version.entity';

/** Whether the claim's workings give today what they gave when saved, recomputed now. */
async function workingsItem(manager: EntityManager, claimId: string): Promise<ChecklistItem> {
  const workings = await manager.find(Working, { where: { claimId }, order: { createdAt: 'ASC' } });
  if (workings.length === 0)
    return checklistItem('workingsRecomputed', true, 'No workings on this claim');
  const differing: string[] = [];
  for (const working of workings) {
    try {
      const { result } = await runCalculation(null, working.calculatorId, working.inputs);
      const outputs = result.outputs as unknown as Record<string, WorkingOutput>;
      if (outputDifferences(working.outputs as Record<string, WorkingOutput>, outputs).length) {
        differing.push(working.calculatorId);
      }
    } catch {
      differing.push(working.calculatorId);
    }
  }
  return differing.length
    ? checklistItem(
        'workingsRecomputed',
        false,
        `Recomputed now, ${differing.length} of ${workings.length} differ (${differing.join(', ')}): re-run them and check the explainer`,
      )
    : checklistItem(
        'workingsRecomputed',
        true,
        `All ${workings.length} recomputed now and unchanged`,
      );
}

/**
 * The sign-off checklist of a claim and its verdict version, worked out now from the
 * records (the workings recomputed afresh). Clearing is refused while an item is open.
 */
export async function signoffChecklist(
  manager: EntityManager,
  claim: Claim,
  version: VerdictVersion | null,
): Promise<ChecklistItem[]> {
  const complete =
    version !== null &&
    version.ratingId !== null &&
    version.bottomLine.trim() !== '' &&
    !isEmptyExplainer(version.body);

  const primary = version?.primarySourceId
    ? await manager.findOne(ClaimSource, {
        where: { claimId: claim.id, sourceId: version.primarySourceId },
        relations: { source: true },
      })
    : null;
  const primaryDone = primary !== null && ['strong', 'adequate'].includes(primary.source.grade);

  const attempts = await manager.find(ReplyAttempt, {
    where: { claimId: claim.id },
    order: { contactedAt: 'DESC' },
  });
  const waiver = claim.replyWaiverReason
    ? await manager.findOneBy(User, { id: claim.replyWaivedById ?? '' })
    : null;
  const latest = attempts[0];

  return [
    checklistItem(
      'verdictComplete',
      complete,
      complete
        ? 'All three are there'
        : 'The verdict needs a rating, a bottom line and an explainer',
    ),
    checklistItem(
      'primarySource',
      primaryDone,
      primary
        ? `${primary.source.title} (${reliabilityGradeLabels[primary.source.grade].toLowerCase()})${primaryDone ? '' : ': grade it strong or adequate, or choose another'}`
        : 'Choose the source that backs the central finding',
    ),
    checklistItem(
      'rightOfReply',
      latest !== undefined || claim.replyWaiverReason !== null,
      latest
        ? `${attempts.length} attempt${attempts.length === 1 ? '' : 's'} logged, the latest to ${latest.contacted} (${replyChannelLabels[latest.channel].toLowerCase()})`
        : claim.replyWaiverReason
          ? `Waived by ${waiver?.displayName ?? 'a desk chief'}: ${claim.replyWaiverReason}`
          : 'Log an attempt to reach the claimant, or ask a desk chief to waive it with a reason',
    ),
    await workingsItem(manager, claim.id),
    legalReviewItem(claim.legalReview),
  ];
}
