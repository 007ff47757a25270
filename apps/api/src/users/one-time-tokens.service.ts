import { HttpStatus, Injectable } from '@nestjs/common';
import { IsNull, type EntityManager } from 'typeorm';
import { ApiError } from '../common/errors/api-error';
import { randomToken, sha256Hex } from '../common/security/tokens';
import { OneTimeToken, type OneTimeTokenPurpose } from './entities/one-time-token.entity';

const purposeLabels: Record<OneTimeTokenPurpose, string> = {
  invitation: 'invitation link',
  password_reset: 'password-reset link',
};

/** Links that work once: issuing one retires any earlier unused link of the same kind. */
@Injectable()
export class OneTimeTokensService {
  async issue(
    manager: EntityManager,
    userId: string,
    purpose: OneTimeTokenPurpose,
    validForMs: number,
  ): Promise<string> {
    await manager.update(
      OneTimeToken,
      { userId, purpose, usedAt: IsNull() },
      { usedAt: new Date() },
    );
    const token = randomToken();
    await manager.insert(OneTimeToken, {
      userId,
      purpose,
      tokenHash: sha256Hex(token),
      expiresAt: new Date(Date.now() + validForMs),
    });
    return token;
  }

  /**
   * Finds a usable token, or fails with 404 (unknown or already used) or 410 (expired).
   * With `lock`, the row stays locked for the rest of the caller's transaction.
   */
  async findUsable(
    manager: EntityManager,
    token: string,
    purpose: OneTimeTokenPurpose,
    { lock = false } = {},
  ): Promise<OneTimeToken> {
    const found = await manager.findOne(OneTimeToken, {
      where: { tokenHash: sha256Hex(token), purpose },
      relations: { user: true },
      ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
    });
    const label = purposeLabels[purpose];
    if (!found || found.usedAt) {
      throw new ApiError(
        HttpStatus.NOT_FOUND,
        `This ${label} is unknown or has already been used`,
        {
          token: 'unknown',
        },
      );
    }
    if (found.expiresAt.getTime() < Date.now()) {
      throw new ApiError(HttpStatus.GONE, `This ${label} has expired; ask for a new one`, {
        token: 'expired',
      });
    }
    return found;
  }

  async consume(manager: EntityManager, token: OneTimeToken): Promise<void> {
    await manager.update(OneTimeToken, { id: token.id }, { usedAt: new Date() });
  }
}
