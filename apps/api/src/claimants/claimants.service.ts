import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { type ClaimantView } from '@skyledger/contracts';
import { DataSource, Repository, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { applyChanges } from '../audit/changes';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { whereWordStarts } from '../common/queries/word-prefix';
import { SearchIndexService } from '../search/search-index.service';
import { toClaimantView } from './claimant-view';
import { type CreateClaimantDto } from './dto/create-claimant.dto';
import { type UpdateClaimantDto } from './dto/update-claimant.dto';
import { Claimant } from './entities/claimant.entity';

const SEARCH_LIMIT = 20;

@Injectable()
export class ClaimantsService {
  constructor(
    @InjectRepository(Claimant) private readonly claimants: Repository<Claimant>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
    private readonly searchIndex: SearchIndexService,
  ) {}

  /** Claimants whose name, or a word of it, starts with `q`; all of them A–Z without `q`. */
  async search(q: string | undefined): Promise<ClaimantView[]> {
    const query = this.claimants.createQueryBuilder('claimant');
    if (q) whereWordStarts(query, 'claimant.name', q);
    const found = await query
      .orderBy('claimant.name', 'ASC')
      .addOrderBy('claimant.id', 'ASC')
      .limit(SEARCH_LIMIT)
      .getMany();
    return found.map(toClaimantView);
  }

  async create(actor: AuthenticatedUser, dto: CreateClaimantDto): Promise<ClaimantView> {
    const claimant = await this.dataSource.transaction((manager) =>
      this.createIn(manager, actor, dto),
    );
    return toClaimantView(claimant);
  }

  /** Creates a claimant inside the caller's transaction (filing a claim with a new one). */
  async createIn(
    manager: EntityManager,
    actor: AuthenticatedUser,
    dto: CreateClaimantDto,
  ): Promise<Claimant> {
    const claimant = await manager.save(
      manager.create(Claimant, {
        name: dto.name,
        kind: dto.kind,
        affiliation: dto.affiliation ?? null,
        notes: dto.notes ?? null,
        nameShownPublicly: false,
        createdById: actor.id,
      }),
    );
    await this.audit.record(manager, {
      actorId: actor.id,
      action: 'claimant.created',
      entityType: 'claimant',
      entityId: claimant.id,
      summary: { name: claimant.name, kind: claimant.kind },
    });
    return claimant;
  }

  /** A claimant named in a request body; unknown ids are a 422 on that field. */
  async findIn(manager: EntityManager, id: string, field: string): Promise<Claimant> {
    const claimant = await manager.findOne(Claimant, { where: { id } });
    if (!claimant) throw ApiError.unprocessable('No such claimant', { [field]: 'notFound' });
    return claimant;
  }

  async update(
    actor: AuthenticatedUser,
    id: string,
    dto: UpdateClaimantDto,
  ): Promise<ClaimantView> {
    const view = await this.dataSource.transaction(async (manager) => {
      const claimant = await manager.findOne(Claimant, {
        where: { id },
        lock: { mode: 'pessimistic_write' },
      });
      if (!claimant) throw new ApiError(HttpStatus.NOT_FOUND, 'No such claimant');
      if (claimant.version !== dto.version) throw ApiError.stale('This claimant', claimant.version);
      if (dto.nameShownPublicly !== undefined && actor.role !== 'desk_chief') {
        throw new ApiError(
          HttpStatus.FORBIDDEN,
          'Only a desk chief decides whether a private individual is named in public',
        );
      }
      const { version: _version, ...fields } = dto;
      const changes = applyChanges(claimant, fields);
      if (Object.keys(changes).length === 0) return toClaimantView(claimant);
      const saved = await manager.save(claimant);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'claimant.updated',
        entityType: 'claimant',
        entityId: id,
        summary: changes,
      });
      return toClaimantView(saved);
    });
    // The claimant's name is searched with each of their claims.
    await this.searchIndex.claimantChanged(id);
    return view;
  }
}
