import { CLAIM_PAGE_SIZE_DEFAULT, type ClaimSortField } from '@skyledger/contracts';
import { type Repository, type SelectQueryBuilder } from 'typeorm';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { type ClaimQueueQueryDto } from './dto/claim-queue-query.dto';
import { Claim } from './entities/claim.entity';

const sortColumns: Record<ClaimSortField, string> = {
  filedAt: 'claim.createdAt',
  updatedAt: 'claim.updatedAt',
  status: 'claim.status',
  summary: 'claim.summary',
};

/** The day after a `YYYY-MM-DD` date, so `filedTo` includes the whole of its day. */
function dayAfter(date: string): string {
  const next = new Date(`${date}T00:00:00Z`);
  next.setUTCDate(next.getUTCDate() + 1);
  return next.toISOString().slice(0, 10);
}

/**
 * The queue's WHERE clause, without paging or sorting. `status: false` leaves the status
 * filter out, for the counts per status. Each filter matches one of the claims indexes.
 */
export function filteredClaims(
  claims: Repository<Claim>,
  query: ClaimQueueQueryDto,
  actor: AuthenticatedUser,
  { status = true } = {},
): SelectQueryBuilder<Claim> {
  const builder = claims.createQueryBuilder('claim');
  if (status && query.status) builder.andWhere('claim.status = :status', { status: query.status });
  if (query.mine) {
    const column = actor.role === 'reporter' ? 'claim.filedById' : 'claim.assigneeId';
    builder.andWhere(`${column} = :me`, { me: actor.id });
  }
  if (query.assignee === 'none') builder.andWhere('claim.assigneeId IS NULL');
  else if (query.assignee) builder.andWhere('claim.assigneeId = :assignee', query);
  if (query.claimant) builder.andWhere('claim.claimantId = :claimant', query);
  if (query.legal !== undefined) builder.andWhere('claim.legalReview = :legal', query);
  if (query.filedFrom) builder.andWhere('claim.createdAt >= :filedFrom', query);
  if (query.filedTo) {
    builder.andWhere('claim.createdAt < :filedBefore', { filedBefore: dayAfter(query.filedTo) });
  }
  if (query.topic) {
    builder.andWhere(
      'EXISTS (SELECT 1 FROM claim_topics t WHERE t.claim_id = claim.id AND t.topic = :topic)',
      { topic: query.topic },
    );
  }
  return builder;
}

/** One page of the queue, sorted, ids only: the rows are loaded with their relations after. */
export function queuePage(
  claims: Repository<Claim>,
  query: ClaimQueueQueryDto,
  actor: AuthenticatedUser,
): SelectQueryBuilder<Claim> {
  const pageSize = query.pageSize ?? CLAIM_PAGE_SIZE_DEFAULT;
  const order = query.order === 'asc' ? 'ASC' : 'DESC';
  const builder = filteredClaims(claims, query, actor)
    .select('claim.id', 'id')
    .orderBy(sortColumns[query.sort ?? 'filedAt'], order)
    .offset(((query.page ?? 1) - 1) * pageSize)
    .limit(pageSize);
  // Tie-breaks run the same way as the sort, so the index can be read in one direction.
  if (query.sort && query.sort !== 'filedAt') builder.addOrderBy('claim.createdAt', order);
  return builder.addOrderBy('claim.id', order);
}
