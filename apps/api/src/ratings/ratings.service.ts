import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type RatingLevelView } from '@skyledger/contracts';
import { DataSource, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { applyChanges } from '../audit/changes';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { VerdictVersion } from '../verdicts/entities/verdict-version.entity';
import { type CreateRatingLevelDto } from './dto/create-rating-level.dto';
import { type UpdateRatingLevelDto } from './dto/update-rating-level.dto';
import { RatingLevel } from './entities/rating-level.entity';

/** The audit trail keys events by a UUID; rating levels are keyed by their slug instead. */
const ratingScaleEntityId = '00000000-0000-4000-8000-00000000a7e5';

const notFound = () => new ApiError(HttpStatus.NOT_FOUND, 'No such level on the rating scale');

/** The rating scale: data a desk chief edits. A level a verdict uses cannot be deleted. */
@Injectable()
export class RatingsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  async list(): Promise<RatingLevelView[]> {
    const levels = await this.dataSource.manager.find(RatingLevel);
    const used = new Set(
      (
        await this.dataSource.manager
          .createQueryBuilder(VerdictVersion, 'v')
          .select('DISTINCT v.rating_id', 'ratingId')
          .where('v.rating_id IS NOT NULL')
          .getRawMany<{ ratingId: string }>()
      ).map((row) => row.ratingId),
    );
    return levels
      .sort((a, b) => (b.number ?? -1) - (a.number ?? -1) || a.id.localeCompare(b.id))
      .map((level) => ({
        id: level.id,
        number: level.number,
        label: level.label,
        description: level.description,
        isRating: level.isRating,
        inUse: used.has(level.id),
        version: level.version,
      }));
  }

  async create(actor: AuthenticatedUser, dto: CreateRatingLevelDto): Promise<RatingLevelView> {
    await this.dataSource.transaction(async (manager) => {
      if (await manager.existsBy(RatingLevel, { id: dto.id })) {
        throw ApiError.conflict('The scale already has a level with this id', { id: 'taken' });
      }
      if (dto.number !== null && (await manager.existsBy(RatingLevel, { number: dto.number }))) {
        throw ApiError.conflict('Another level already has this number', { number: 'taken' });
      }
      await manager.insert(RatingLevel, { ...dto, version: 1 });
      await this.record(manager, actor, 'rating_level.added', { ...dto });
    });
    return this.view(dto.id);
  }

  async update(
    actor: AuthenticatedUser,
    id: string,
    dto: UpdateRatingLevelDto,
  ): Promise<RatingLevelView> {
    await this.dataSource.transaction(async (manager) => {
      const level = await manager.findOne(RatingLevel, {
        where: { id },
        lock: { mode: 'pessimistic_write' },
      });
      if (!level) throw notFound();
      if (level.version !== dto.version) throw ApiError.stale('This level', level.version);
      const changes = applyChanges(level, { label: dto.label, description: dto.description });
      if (Object.keys(changes).length === 0) return;
      await manager.save(level);
      await this.record(manager, actor, 'rating_level.updated', { id, ...changes });
    });
    return this.view(id);
  }

  async remove(actor: AuthenticatedUser, id: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const level = await manager.findOne(RatingLevel, {
        where: { id },
        lock: { mode: 'pessimistic_write' },
      });
      if (!level) throw notFound();
      if (await manager.existsBy(VerdictVersion, { ratingId: id })) {
        throw ApiError.conflict(
          `“${level.label}” is used by a verdict, so it stays on the scale; edit its words instead`,
          { id: 'inUse' },
        );
      }
      await manager.delete(RatingLevel, { id });
      await this.record(manager, actor, 'rating_level.removed', { id, label: level.label });
    });
  }

  private async view(id: string): Promise<RatingLevelView> {
    const found = (await this.list()).find((level) => level.id === id);
    if (!found) throw notFound();
    return found;
  }

  private record(
    manager: EntityManager,
    actor: AuthenticatedUser,
    action: string,
    summary: Record<string, unknown>,
  ) {
    return this.audit.record(manager, {
      actorId: actor.id,
      action,
      entityType: 'rating_scale',
      entityId: ratingScaleEntityId,
      summary,
    });
  }
}
