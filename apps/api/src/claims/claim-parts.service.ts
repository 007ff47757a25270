import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, type EntityManager, type FindOptionsWhere } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { applyChanges } from '../audit/changes';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { type ClaimPartKind } from './claim-part-kind';
import { assertMayChangePart } from './claim-policy';
import { ClaimsService } from './claims.service';
import { type ClaimPart } from './entities/claim-part';

/** Adds, changes and removes the records kept under a claim, each change audited with it. */
@Injectable()
export class ClaimPartsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
  ) {}

  async add<Part extends ClaimPart, View>(
    kind: ClaimPartKind<Part, View>,
    actor: AuthenticatedUser,
    claimId: string,
    values: Partial<Part>,
  ): Promise<View> {
    const id = await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lockForContribution(manager, claimId, actor, kind.addRoles);
      const part = manager.create(kind.entity, {
        ...values,
        claimId,
        createdById: actor.id,
      } as Part);
      await kind.beforeSave?.(manager, claim, part);
      const saved = await manager.save(part);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: `${kind.name}.added`,
        entityType: kind.name,
        entityId: saved.id,
        claimId,
        summary: kind.summarise(saved),
      });
      return saved.id;
    });
    return this.view(kind, this.dataSource.manager, id);
  }

  async update<Part extends ClaimPart, View>(
    kind: ClaimPartKind<Part, View>,
    actor: AuthenticatedUser,
    claimId: string,
    partId: string,
    patch: Partial<Part>,
    version: number,
  ): Promise<View> {
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lock(manager, claimId);
      const part = await this.findPart(kind, manager, claimId, partId);
      if (part.version !== version) throw ApiError.stale(`This ${kind.name}`, part.version);
      (kind.assertMayChange ?? defaultAssert(kind.name))(actor, part);
      const changes = applyChanges(part, patch);
      if (Object.keys(changes).length === 0) return;
      await kind.beforeSave?.(manager, claim, part);
      await manager.save(part);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: `${kind.name}.updated`,
        entityType: kind.name,
        entityId: part.id,
        claimId,
        summary: changes,
      });
    });
    return this.view(kind, this.dataSource.manager, partId);
  }

  async remove<Part extends ClaimPart, View>(
    kind: ClaimPartKind<Part, View>,
    actor: AuthenticatedUser,
    claimId: string,
    partId: string,
  ): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lock(manager, claimId);
      const part = await this.findPart(kind, manager, claimId, partId);
      (kind.assertMayRemove ?? kind.assertMayChange ?? defaultAssert(kind.name))(actor, part);
      await kind.beforeRemove?.(manager, claim, part);
      const summary = kind.summarise(part);
      await manager.remove(part);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: `${kind.name}.removed`,
        entityType: kind.name,
        entityId: partId,
        claimId,
        summary,
      });
    });
  }

  private async findPart<Part extends ClaimPart, View>(
    kind: ClaimPartKind<Part, View>,
    manager: EntityManager,
    claimId: string,
    partId: string,
  ): Promise<Part> {
    const part = await manager.findOne(kind.entity, {
      where: { id: partId, claimId } as FindOptionsWhere<Part>,
      lock: { mode: 'pessimistic_write' },
    });
    if (!part) throw new ApiError(HttpStatus.NOT_FOUND, `No such ${kind.name} on this claim`);
    return part;
  }

  private async view<Part extends ClaimPart, View>(
    kind: ClaimPartKind<Part, View>,
    manager: EntityManager,
    id: string,
  ): Promise<View> {
    // One query: findOne with a relation first picks the distinct id in a query of its own.
    const part = await manager
      .createQueryBuilder(kind.entity, 'part')
      .leftJoinAndSelect('part.createdBy', 'createdBy')
      .where('part.id = :id', { id })
      .getOneOrFail();
    return kind.toView(part);
  }
}

const defaultAssert =
  (name: string) =>
  (actor: AuthenticatedUser, part: ClaimPart): void =>
    assertMayChangePart(actor, part, name);
