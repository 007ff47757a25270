import { Inject, Injectable, Logger, UnauthorizedException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, IsNull, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { randomToken, sha256Hex } from '../common/security/tokens';
import { authConfig, type AuthConfig } from '../config/configuration';
import { RefreshToken } from './entities/refresh-token.entity';

const sessionEnded = () => new UnauthorizedException('Your session has ended; sign in again');

/**
 * Rotating refresh tokens. Each refresh hands out a new token of the same family and
 * marks the old one replaced. A replaced token presented again within the grace period
 * (two tabs refreshing at once) gets a sibling; later, it is taken as a stolen copy and
 * the whole family is revoked, signing out the thief and the owner alike.
 */
@Injectable()
export class RefreshTokensService {
  private readonly logger = new Logger(RefreshTokensService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(authConfig.KEY) private readonly config: AuthConfig,
    private readonly audit: AuditService,
  ) {}

  get ttlMs(): number {
    return this.config.refreshTtlDays * 86_400_000;
  }

  async issue(
    manager: EntityManager,
    userId: string,
    familyId: string = randomUUID(),
  ): Promise<string> {
    const token = randomToken();
    await manager.insert(RefreshToken, {
      userId,
      familyId,
      tokenHash: sha256Hex(token),
      expiresAt: new Date(Date.now() + this.ttlMs),
    });
    return token;
  }

  /** Exchanges a refresh token for a new one; returns whose it is and the new token. */
  async rotate(token: string): Promise<{ userId: string; token: string }> {
    const outcome = await this.dataSource.transaction(async (manager) => {
      const current = await manager.findOne(RefreshToken, {
        where: { tokenHash: sha256Hex(token) },
        lock: { mode: 'pessimistic_write' },
      });
      if (!current || current.revokedAt || current.expiresAt.getTime() <= Date.now())
        return undefined;
      if (current.replacedAt) {
        const sinceReplaced = Date.now() - current.replacedAt.getTime();
        if (sinceReplaced > this.config.refreshReuseGraceSeconds * 1000) {
          await this.revokeFamilyIn(manager, current.familyId);
          await this.audit.record(manager, {
            actorId: current.userId,
            action: 'session.refresh_token_reused',
            entityType: 'user',
            entityId: current.userId,
            summary: {
              family: current.familyId,
              note: 'a replaced refresh token was presented again; family revoked',
            },
          });
          return 'reused' as const;
        }
      } else {
        await manager.update(RefreshToken, { id: current.id }, { replacedAt: new Date() });
      }
      return {
        userId: current.userId,
        token: await this.issue(manager, current.userId, current.familyId),
      };
    });
    if (outcome === 'reused')
      this.logger.warn('refresh token reuse detected; session family revoked');
    if (!outcome || outcome === 'reused') throw sessionEnded();
    return outcome;
  }

  /** Signs out the session this token belongs to (all its rotations). */
  async revokeFamilyOf(token: string): Promise<void> {
    const found = await this.dataSource
      .getRepository(RefreshToken)
      .findOne({ where: { tokenHash: sha256Hex(token) } });
    if (found) await this.revokeFamilyIn(this.dataSource.manager, found.familyId);
  }

  async revokeAllForUser(manager: EntityManager, userId: string): Promise<void> {
    await manager.update(RefreshToken, { userId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async revokeFamilyIn(manager: EntityManager, familyId: string): Promise<void> {
    await manager.update(
      RefreshToken,
      { familyId, revokedAt: IsNull() },
      { revokedAt: new Date() },
    );
  }
}
