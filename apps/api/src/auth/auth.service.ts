import {
  ForbiddenException,
  HttpStatus,
  Inject,
  Injectable,
  UnauthorizedException,
} from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectDataSource } from '@nestjs/typeorm';
import { type InvitationInfo, type SessionResponse } from '@skyledger/contracts';
import { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { ApiError } from '../common/errors/api-error';
import { appConfig, authConfig, type AppConfig, type AuthConfig } from '../config/configuration';
import { OutboxService } from '../mail/outbox.service';
import { OutboxWorker } from '../mail/outbox.worker';
import { passwordResetMail } from '../mail/templates/password-reset.mail';
import { User } from '../users/entities/user.entity';
import { OneTimeTokensService } from '../users/one-time-tokens.service';
import { PasswordService } from '../users/password.service';
import { normaliseEmail, toCurrentUser } from '../users/user-views';
import { type AccessTokenPayload } from './jwt.strategy';
import { RefreshTokensService } from './refresh-tokens.service';

/** A session as the controller needs it: the body for the client and the cookie's token. */
export interface IssuedSession {
  body: SessionResponse;
  refreshToken: string;
}

const wrongCredentials = () => new UnauthorizedException('E-mail or password is wrong');

@Injectable()
export class AuthService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jwt: JwtService,
    private readonly passwords: PasswordService,
    private readonly refreshTokens: RefreshTokensService,
    private readonly oneTimeTokens: OneTimeTokensService,
    private readonly audit: AuditService,
    private readonly outbox: OutboxService,
    private readonly outboxWorker: OutboxWorker,
    @Inject(authConfig.KEY) private readonly config: AuthConfig,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
  ) {}

  async signIn(emailInput: string, password: string): Promise<IssuedSession> {
    const users = this.dataSource.getRepository(User);
    const user = await users
      .createQueryBuilder('user')
      .addSelect('user.passwordHash')
      .where('user.email = :email', { email: normaliseEmail(emailInput) })
      .getOne();
    if (!user?.passwordHash) {
      await this.passwords.verifyNothing(password);
      throw wrongCredentials();
    }
    if (user.lockedUntil && user.lockedUntil.getTime() > Date.now())
      throw this.locked(user.lockedUntil);

    if (!(await this.passwords.verify(user.passwordHash, password))) {
      const lockedUntil = await this.countFailure(user);
      if (lockedUntil) throw this.locked(lockedUntil);
      throw wrongCredentials();
    }
    if (user.status !== 'active') {
      throw new ForbiddenException('This account is disabled; ask the desk chief');
    }
    return this.dataSource.transaction(async (manager) => {
      await manager.update(
        User,
        { id: user.id },
        { failedSignIns: 0, lockedUntil: null, lastSignInAt: new Date() },
      );
      const refreshToken = await this.refreshTokens.issue(manager, user.id);
      return { body: this.sessionBody(user), refreshToken };
    });
  }

  async refresh(token: string | undefined): Promise<IssuedSession> {
    if (!token) throw new UnauthorizedException('Not signed in');
    const rotated = await this.refreshTokens.rotate(token);
    const user = await this.dataSource
      .getRepository(User)
      .findOne({ where: { id: rotated.userId } });
    if (!user || user.status !== 'active') {
      await this.refreshTokens.revokeFamilyOf(rotated.token);
      throw new UnauthorizedException('Your session has ended; sign in again');
    }
    return { body: this.sessionBody(user), refreshToken: rotated.token };
  }

  async signOut(token: string | undefined): Promise<void> {
    if (token) await this.refreshTokens.revokeFamilyOf(token);
  }

  async invitation(token: string): Promise<InvitationInfo> {
    const found = await this.oneTimeTokens.findUsable(this.dataSource.manager, token, 'invitation');
    this.assertStillInvited(found.user);
    return {
      email: found.user.email,
      displayName: found.user.displayName,
      role: found.user.role,
      expiresAt: found.expiresAt.toISOString(),
    };
  }

  async acceptInvitation(token: string, password: string): Promise<void> {
    const passwordHash = await this.passwords.hash(password);
    await this.dataSource.transaction(async (manager) => {
      const found = await this.oneTimeTokens.findUsable(manager, token, 'invitation', {
        lock: true,
      });
      this.assertStillInvited(found.user);
      await manager.update(User, { id: found.userId }, { passwordHash, status: 'active' });
      await this.oneTimeTokens.consume(manager, found);
      await this.audit.record(manager, {
        actorId: found.userId,
        action: 'user.invitation_accepted',
        entityType: 'user',
        entityId: found.userId,
      });
    });
  }

  /** Always succeeds from the caller's side, so nobody can probe which e-mails have accounts. */
  async requestPasswordReset(emailInput: string): Promise<void> {
    const queued = await this.dataSource.transaction(async (manager) => {
      const user = await manager.findOne(User, { where: { email: normaliseEmail(emailInput) } });
      if (!user || user.status !== 'active') return false;
      const minutes = this.config.passwordResetTtlMinutes;
      const token = await this.oneTimeTokens.issue(
        manager,
        user.id,
        'password_reset',
        minutes * 60_000,
      );
      const mail = passwordResetMail({
        displayName: user.displayName,
        url: `${this.app.appUrl}/reset-password?token=${encodeURIComponent(token)}`,
        validMinutes: minutes,
      });
      await this.outbox.enqueue(manager, { kind: 'password_reset', to: user.email, ...mail });
      await this.audit.record(manager, {
        actorId: null,
        action: 'user.password_reset_requested',
        entityType: 'user',
        entityId: user.id,
      });
      return true;
    });
    if (queued) this.outboxWorker.nudge();
  }

  async resetPassword(token: string, password: string): Promise<void> {
    const passwordHash = await this.passwords.hash(password);
    await this.dataSource.transaction(async (manager) => {
      const found = await this.oneTimeTokens.findUsable(manager, token, 'password_reset', {
        lock: true,
      });
      if (found.user.status !== 'active') {
        throw new ApiError(
          HttpStatus.NOT_FOUND,
          'This password-reset link is unknown or has already been used',
          {
            token: 'unknown',
          },
        );
      }
      await manager.update(
        User,
        { id: found.userId },
        { passwordHash, failedSignIns: 0, lockedUntil: null },
      );
      await this.oneTimeTokens.consume(manager, found);
      // A new password ends every session, including one an intruder may hold.
      await this.refreshTokens.revokeAllForUser(manager, found.userId);
      await this.audit.record(manager, {
        actorId: found.userId,
        action: 'user.password_reset',
        entityType: 'user',
        entityId: found.userId,
      });
    });
  }

  private sessionBody(user: User): SessionResponse {
    const payload: AccessTokenPayload = { sub: user.id };
    return {
      accessToken: this.jwt.sign(payload),
      expiresIn: this.config.accessTtlSeconds,
      user: toCurrentUser({ ...user, status: 'active' }, this.app),
    };
  }

  private assertStillInvited(user: User): void {
    if (user.status !== 'invited') {
      throw new ApiError(
        HttpStatus.NOT_FOUND,
        'This invitation link is unknown or has already been used',
        {
          token: 'unknown',
        },
      );
    }
  }

  /**
   * Counts a failed sign-in in one statement (so parallel attempts all count) and locks
   * the account when the threshold is reached. Returns the lock's end if this failure
   * locked it.
   */
  private async countFailure(user: User): Promise<Date | undefined> {
    const { lockoutThreshold, lockoutMinutes } = this.config;
    await this.dataSource.query(
      `UPDATE users
          SET locked_until = IF(failed_sign_ins + 1 >= ?, NOW(3) + INTERVAL ? MINUTE, locked_until),
              failed_sign_ins = IF(failed_sign_ins + 1 >= ?, 0, failed_sign_ins + 1)
        WHERE id = ?`,
      [lockoutThreshold, lockoutMinutes, lockoutThreshold, user.id],
    );
    const after = await this.dataSource.getRepository(User).findOne({ where: { id: user.id } });
    if (!after?.lockedUntil || after.lockedUntil.getTime() <= Date.now()) return undefined;
    await this.audit.record(this.dataSource.manager, {
      actorId: null,
      action: 'user.locked',
      entityType: 'user',
      entityId: user.id,
      summary: {
        until: after.lockedUntil.toISOString(),
        after: `${lockoutThreshold} failed sign-ins`,
      },
    });
    return after.lockedUntil;
  }

  private locked(until: Date): ApiError {
    return new ApiError(
      HttpStatus.LOCKED,
      `This account is locked after repeated failed sign-ins until ${until.toISOString().slice(11, 16)} UTC; try again then, or reset your password`,
    );
  }
}
