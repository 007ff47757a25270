import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { type ClaimSourceView, type SourceView } from '@skyledger/contracts';
import { DataSource, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { applyChanges } from '../audit/changes';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { assertMayChangePart } from '../claims/claim-policy';
import { ClaimsService } from '../claims/claims.service';
import { ApiError } from '../common/errors/api-error';
import { whereWordStarts } from '../common/queries/word-prefix';
import { assertExactlyOne } from '../common/validation/exactly-one';
import { SearchIndexService } from '../search/search-index.service';
import { assertNotInVerdict } from '../verdicts/verdict-references';
import { type CreateSourceDto } from './dto/create-source.dto';
import { type LinkSourceDto } from './dto/link-source.dto';
import { type UpdateSourceDto } from './dto/update-source.dto';
import { ClaimSource } from './entities/claim-source.entity';
import { Source } from './entities/source.entity';
import { toClaimSourceView, toSourceView } from './source-view';

const SEARCH_LIMIT = 20;

/** Anyone must be able to find the source again, except an interview the desk did itself. */
function assertTraceable(source: Pick<Source, 'kind' | 'doi' | 'url'>): void {
  if (source.kind === 'expert_interview' || source.doi || source.url) return;
  throw ApiError.unprocessable('Give a DOI or a web address so others can find the source', {
    url: 'doiOrUrlRequired',
  });
}

@Injectable()
export class SourcesService {
  constructor(
    @InjectRepository(Source) private readonly sources: Repository<Source>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
    private readonly searchIndex: SearchIndexService,
  ) {}

  async search(q: string | undefined): Promise<SourceView[]> {
    const query = this.sources
      .createQueryBuilder('source')
      .leftJoinAndSelect('source.createdBy', 'by');
    if (q) whereWordStarts(query, 'source.title', q, ['source.doi']);
    const found = await query
      .orderBy('source.title', 'ASC')
      .addOrderBy('source.id', 'ASC')
      .limit(SEARCH_LIMIT)
      .getMany();
    return found.map(toSourceView);
  }

  /** Cites a source for a claim; a new source is created with it in the same transaction. */
  async link(
    actor: AuthenticatedUser,
    claimId: string,
    dto: LinkSourceDto,
  ): Promise<ClaimSourceView> {
    assertExactlyOne(
      dto,
      'sourceId',
      'source',
      'Give the id of an existing source or describe a new one (one of the two)',
    );
    const sourceId = await this.dataSource.transaction(async (manager) => {
      await this.claims.lockForContribution(manager, claimId, actor);
      const source = dto.source
        ? await this.createIn(manager, actor, dto.source)
        : await manager.findOne(Source, { where: { id: dto.sourceId } });
      if (!source) throw ApiError.unprocessable('No such source', { sourceId: 'notFound' });
      if (await manager.existsBy(ClaimSource, { claimId, sourceId: source.id })) {
        throw ApiError.conflict('This source is already cited for this claim', {
          sourceId: 'alreadyLinked',
        });
      }
      await manager.insert(ClaimSource, { claimId, sourceId: source.id, linkedById: actor.id });
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'source.linked',
        entityType: 'source',
        entityId: source.id,
        claimId,
        summary: { title: source.title, kind: source.kind, grade: source.grade },
      });
      return source.id;
    });
    await this.searchIndex.sourcesChanged([sourceId]);
    const link = await this.dataSource.manager.findOneOrFail(ClaimSource, {
      where: { claimId, sourceId },
      relations: { source: { createdBy: true }, linkedBy: true },
    });
    return toClaimSourceView(link);
  }

  async unlink(actor: AuthenticatedUser, claimId: string, sourceId: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      await this.claims.lockForContribution(manager, claimId, actor);
      const link = await manager.findOne(ClaimSource, {
        where: { claimId, sourceId },
        relations: { source: true },
      });
      if (!link)
        throw new ApiError(HttpStatus.NOT_FOUND, 'This source is not cited for this claim');
      assertMayChangePart(actor, { createdById: link.linkedById }, 'citation');
      await assertNotInVerdict(manager, claimId, { kind: 'source', id: sourceId });
      await manager.delete(ClaimSource, { claimId, sourceId });
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'source.unlinked',
        entityType: 'source',
        entityId: sourceId,
        claimId,
        summary: { title: link.source.title },
      });
    });
  }

  /** Edits a source wherever it is cited; needs the version the editor saw. */
  async update(actor: AuthenticatedUser, id: string, dto: UpdateSourceDto): Promise<SourceView> {
    await this.dataSource.transaction(async (manager) => {
      const source = await manager.findOne(Source, {
        where: { id },
        lock: { mode: 'pessimistic_write' },
      });
      if (!source) throw new ApiError(HttpStatus.NOT_FOUND, 'No such source');
      if (source.version !== dto.version) throw ApiError.stale('This source', source.version);
      assertMayChangePart(actor, source, 'source');
      const { version: _version, ...fields } = dto;
      const changes = applyChanges(source, fields);
      if (Object.keys(changes).length === 0) return;
      assertTraceable(source);
      await manager.save(source);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'source.updated',
        entityType: 'source',
        entityId: id,
        summary: changes,
      });
    });
    await this.searchIndex.sourcesChanged([id]);
    return toSourceView(
      await this.sources.findOneOrFail({ where: { id }, relations: { createdBy: true } }),
    );
  }

  private async createIn(
    manager: DataSource['manager'],
    actor: AuthenticatedUser,
    dto: CreateSourceDto,
  ): Promise<Source> {
    assertTraceable({ kind: dto.kind, doi: dto.doi ?? null, url: dto.url ?? null });
    const source = await manager.save(
      manager.create(Source, {
        title: dto.title,
        authors: dto.authors ?? null,
        publisher: dto.publisher ?? null,
        year: dto.year ?? null,
        doi: dto.doi ?? null,
        url: dto.url ?? null,
        accessedOn: dto.accessedOn ?? null,
        kind: dto.kind,
        grade: dto.grade,
        gradeReason: dto.gradeReason,
        createdById: actor.id,
      }),
    );
    await this.audit.record(manager, {
      actorId: actor.id,
      action: 'source.created',
      entityType: 'source',
      entityId: source.id,
      summary: { title: source.title, kind: source.kind, grade: source.grade },
    });
    return source;
  }
}
