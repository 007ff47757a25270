import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  type DeskPerson,
  type Role,
  type UserListItem,
  type UsersListResponse,
  type UserStatus,
} from '@skyledger/contracts';
import { DataSource, Not, Repository, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { appConfig, authConfig, type AppConfig, type AuthConfig } from '../config/configuration';
import { OutboxService } from '../mail/outbox.service';
import { OutboxWorker } from '../mail/outbox.worker';
import { invitationMail } from '../mail/templates/invitation.mail';
import { type InviteUserDto } from './dto/invite-user.dto';
import { type ListUsersQueryDto } from './dto/list-users-query.dto';
import { type UpdateUserDto } from './dto/update-user.dto';
import { User } from './entities/user.entity';
import { OneTimeTokensService } from './one-time-tokens.service';
import { PasswordService } from './password.service';
import { normaliseEmail, toUserListItem } from './user-views';

const sortColumns = {
  displayName: 'user.displayName',
  email: 'user.email',
  role: 'user.role',
  status: 'user.status',
  createdAt: 'user.createdAt',
  lastSignInAt: 'user.lastSignInAt',
} as const;

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
    private readonly outbox: OutboxService,
    private readonly outboxWorker: OutboxWorker,
    private readonly tokens: OneTimeTokensService,
    private readonly passwords: PasswordService,
    @Inject(authConfig.KEY) private readonly auth: AuthConfig,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
  ) {}

  async list(query: ListUsersQueryDto): Promise<UsersListResponse> {
    const order = query.order === 'desc' ? 'DESC' : 'ASC';
    const [items, total] = await this.users
      .createQueryBuilder('user')
      .orderBy(sortColumns[query.sort ?? 'displayName'], order)
      .addOrderBy('user.displayName', 'ASC')
      .addOrderBy('user.id', 'ASC')
      .getManyAndCount();
    return { items: items.map(toUserListItem), total };
  }

  async activePeople(): Promise<DeskPerson[]> {
    const people = await this.users.find({
      where: { status: 'active' },
      order: { displayName: 'ASC', id: 'ASC' },
    });
    return people.map(({ id, displayName, role }) => ({ id, displayName, role }));
  }

  async findById(id: string): Promise<User> {
    const user = await this.users.findOne({ where: { id } });
    if (!user) throw new ApiError(HttpStatus.NOT_FOUND, 'No such person on the desk');
    return user;
  }

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOne({ where: { email: normaliseEmail(email) } });
  }

  async invite(actor: AuthenticatedUser, dto: InviteUserDto): Promise<UserListItem> {
    const email = normaliseEmail(dto.email);
    const user = await this.dataSource.transaction(async (manager) => {
      if (await manager.existsBy(User, { email })) {
        throw ApiError.conflict('Someone on the desk already has this e-mail address', {
          email: 'taken',
        });
      }
      const created = manager.create(User, {
        email,
        displayName: dto.displayName,
        role: dto.role,
        status: 'invited',
      });
      await manager.save(created);
      await this.sendInvitation(manager, actor, created);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'user.invited',
        entityType: 'user',
        entityId: created.id,
        summary: { email, displayName: dto.displayName, role: dto.role },
      });
      return created;
    });
    this.outboxWorker.nudge();
    return toUserListItem(user);
  }

  async resendInvitation(actor: AuthenticatedUser, id: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const user = await this.lockUser(manager, id);
      if (user.status !== 'invited') {
        throw ApiError.unprocessable(
          'Only people who have not yet accepted can be sent a new invitation',
          {
            status: 'notInvited',
          },
        );
      }
      await this.sendInvitation(manager, actor, user);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'user.invitation_resent',
        entityType: 'user',
        entityId: user.id,
      });
    });
    this.outboxWorker.nudge();
  }

  async update(actor: AuthenticatedUser, id: string, dto: UpdateUserDto): Promise<UserListItem> {
    return this.dataSource.transaction(async (manager) => {
      const user = await this.lockUser(manager, id);
      if (user.version !== dto.version) throw ApiError.stale('This person', user.version);

      const changes: Record<string, { from: unknown; to: unknown }> = {};
      if (dto.displayName !== undefined && dto.displayName !== user.displayName) {
        changes.displayName = { from: user.displayName, to: dto.displayName };
        user.displayName = dto.displayName;
      }
      if (dto.role !== undefined && dto.role !== user.role) {
        await this.assertNotLastDeskChief(manager, user, 'role');
        changes.role = { from: user.role, to: dto.role };
        user.role = dto.role;
      }
      if (dto.status !== undefined) {
        const next = await this.nextStatus(manager, user, dto.status);
        if (next !== user.status) {
          if (next === 'disabled') {
            if (user.id === actor.id) {
              throw ApiError.unprocessable('You cannot disable your own account', {
                status: 'self',
              });
            }
            await this.assertNotLastDeskChief(manager, user, 'status');
          }
          changes.status = { from: user.status, to: next };
          user.status = next;
        }
      }
      if (Object.keys(changes).length === 0) return toUserListItem(user);

      const saved = await manager.save(user);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'user.updated',
        entityType: 'user',
        entityId: user.id,
        summary: changes,
      });
      return toUserListItem(saved);
    });
  }

  /** For the command line: the first desk chief, with a password, ready to sign in. */
  async createDeskChief(input: {
    email: string;
    displayName: string;
    password: string;
  }): Promise<User> {
    return this.upsertActiveUser({ ...input, role: 'desk_chief' });
  }

  /**
   * Creates an active person with this password, or brings an existing one (matched by
   * e-mail) to this name, role and password. Used by the demo seed and the command line.
   */
  async upsertActiveUser(input: {
    email: string;
    displayName: string;
    role: Role;
    password: string;
  }): Promise<User> {
    const email = normaliseEmail(input.email);
    const passwordHash = await this.passwords.hash(input.password);
    return this.dataSource.transaction(async (manager) => {
      const existing = await manager.findOne(User, {
        where: { email },
        lock: { mode: 'pessimistic_write' },
      });
      const user = existing ?? manager.create(User, { email });
      Object.assign(user, {
        displayName: input.displayName,
        role: input.role,
        status: 'active',
        passwordHash,
        failedSignIns: 0,
        lockedUntil: null,
      });
      const saved = await manager.save(user);
      await this.audit.record(manager, {
        actorId: null,
        action: existing ? 'user.updated' : 'user.created',
        entityType: 'user',
        entityId: saved.id,
        summary: { email, role: input.role, by: 'command line or seed' },
      });
      return saved;
    });
  }

  private async lockUser(manager: EntityManager, id: string): Promise<User> {
    const user = await manager.findOne(User, {
      where: { id },
      lock: { mode: 'pessimistic_write' },
    });
    if (!user) throw new ApiError(HttpStatus.NOT_FOUND, 'No such person on the desk');
    return user;
  }

  /**
   * Invited people stay invited until they accept; a re-enabled person who never accepted
   * goes back to waiting for their invitation.
   */
  private async nextStatus(
    manager: EntityManager,
    user: User,
    requested: 'active' | 'disabled',
  ): Promise<UserStatus> {
    if (requested === 'disabled') return 'disabled';
    if (user.status !== 'disabled') return user.status;
    const withPassword = await manager.findOne(User, {
      where: { id: user.id },
      select: { id: true, passwordHash: true },
    });
    return withPassword?.passwordHash ? 'active' : 'invited';
  }

  /** The desk must always keep one active desk chief, or nobody could manage it. */
  private async assertNotLastDeskChief(
    manager: EntityManager,
    user: User,
    field: string,
  ): Promise<void> {
    if (user.role !== 'desk_chief' || user.status !== 'active') return;
    const others = await manager.find(User, {
      where: { role: 'desk_chief', status: 'active', id: Not(user.id) },
      lock: { mode: 'pessimistic_write' },
    });
    if (others.length === 0) {
      throw ApiError.unprocessable(
        'The desk needs at least one active desk chief; appoint another first',
        {
          [field]: 'lastDeskChief',
        },
      );
    }
  }

  private async sendInvitation(
    manager: EntityManager,
    actor: AuthenticatedUser,
    user: User,
  ): Promise<void> {
    const token = await this.tokens.issue(
      manager,
      user.id,
      'invitation',
      this.auth.inviteTtlHours * 3_600_000,
    );
    const mail = invitationMail({
      displayName: user.displayName,
      role: user.role,
      invitedBy: actor.displayName,
      url: `${this.app.appUrl}/accept-invite?token=${encodeURIComponent(token)}`,
      validHours: this.auth.inviteTtlHours,
    });
    await this.outbox.enqueue(manager, { kind: 'invitation', to: user.email, ...mail });
  }
}
