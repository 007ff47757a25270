import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { claimStatuses, type ClaimStatus } from '@skyledger/contracts';
import { DataSource } from 'typeorm';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { EntityChanges } from '../database/entity-changes';
import { filteredClaims } from './claim-queue';
import { type ClaimQueueQueryDto } from './dto/claim-queue-query.dto';
import { Claim } from './entities/claim.entity';

export type StatusCounts = Record<ClaimStatus, number>;

/** How long counts are kept at most: what another API instance's writes may take to show. */
const KEEP_MS = 5_000;
const MAX_ENTRIES = 500;

/**
 * The queue's counts per status, kept a few seconds per set of filters. Counting every
 * claim a filter matches (100 000 with none) took longer than the rest of a queue page
 * together, and the counts are the same for every page and sort (npm run bench).
 *
 * Exact on this instance: every claim this instance saves moves a generation on, before
 * and after its transaction commits, and counts read while the generation moved are not
 * kept. Writes by another instance show within five seconds.
 */
@Injectable()
export class ClaimStatusCounts {
  private readonly changes: EntityChanges<Claim>;
  private readonly kept = new Map<
    string,
    { generation: number; at: number; counts: StatusCounts }
  >();

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {
    this.changes = new EntityChanges(dataSource, Claim);
  }

  async counts(query: ClaimQueueQueryDto, actor: AuthenticatedUser): Promise<StatusCounts> {
    const key = JSON.stringify([
      query.mine ? `${actor.role === 'reporter' ? 'filed' : 'assigned'}:${actor.id}` : null,
      query.assignee,
      query.claimant,
      query.legal,
      query.filedFrom,
      query.filedTo,
      query.topic,
    ]);
    const generation = this.changes.generation;
    const kept = this.kept.get(key);
    if (kept && kept.generation === generation && Date.now() - kept.at < KEEP_MS) {
      return kept.counts;
    }
    const rows = await filteredClaims(this.dataSource.getRepository(Claim), query, actor, {
      status: false,
    })
      .select('claim.status', 'status')
      .addSelect('COUNT(*)', 'count')
      .groupBy('claim.status')
      .getRawMany<{ status: ClaimStatus; count: string }>();
    const counts = Object.fromEntries(claimStatuses.map((status) => [status, 0])) as StatusCounts;
    for (const row of rows) counts[row.status] = Number(row.count);
    if (this.changes.generation === generation) {
      if (this.kept.size >= MAX_ENTRIES) this.kept.clear();
      this.kept.set(key, { generation, at: Date.now(), counts });
    }
    return counts;
  }
}
