import { type ClaimHistoryEvent, type ClaimListItem } from '@skyledger/contracts';
import { type AuditEvent } from '../audit/entities/audit-event.entity';
import { toPersonRef } from '../common/views/person-ref';
import { type User } from '../users/entities/user.entity';
import { type Claimant } from '../claimants/entities/claimant.entity';
import { type ClaimTopic } from './entities/claim-topic.entity';
import { type Claim } from './entities/claim.entity';

/** What a list item shows of a claim: the entity with these relations, or a queue row. */
export type ListedClaim = Pick<
  Claim,
  'id' | 'summary' | 'status' | 'legalReview' | 'createdAt' | 'updatedAt'
> & {
  topics: Array<Pick<ClaimTopic, 'topic'>>;
  claimant: Pick<Claimant, 'id' | 'name' | 'kind'>;
  assignee: Pick<User, 'id' | 'displayName'> | null;
  filedBy: Pick<User, 'id' | 'displayName'>;
};

/** Needs `claimant`, `assignee`, `filedBy` and `topics` loaded. */
export function toClaimListItem(claim: ListedClaim): ClaimListItem {
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
