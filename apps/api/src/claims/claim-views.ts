import { type ClaimHistoryEvent, type ClaimListItem } from '@skyledger/contracts';
import { type AuditEvent } from '../audit/entities/audit-event.entity';
import { toPersonRef } from '../common/views/person-ref';
import { type User } from '../users/entities/user.entity';
import { type Claim } from './entities/claim.entity';

/** Needs `claimant`, `assignee`, `filedBy` and `topics` loaded. */
export function toClaimListItem(claim: Claim): ClaimListItem {
  return {
    id: claim.id,
    summary: claim.summary,
    status: claim.status,
    topics: claim.topics.map((topic) => topic.topic).sort(),
    legalReview: claim.legalReview,
    claimant: { id: claim.claimant.id, name: claim.claimant.name, kind: claim.claimant.kind },
    assignee: claim.assignee ? toPersonRef(claim.assignee) : null,
    filedBy: toPersonRef(claim.filedBy),
    filedAt: claim.createdAt.toISOString(),
    updatedAt: claim.updatedAt.toISOString(),
  };
}

export function toClaimHistoryEvent(event: AuditEvent, actor: User | undefined): ClaimHistoryEvent {
  return {
    id: event.id,
    action: event.action,
    entityType: event.entityType,
    entityId: event.entityId,
    actor: actor ? toPersonRef(actor) : null,
    summary: event.summary,
    at: event.at.toISOString(),
  };
}
