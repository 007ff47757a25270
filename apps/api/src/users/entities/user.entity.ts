import {
  roles,
  userStatuses,
  type NotificationKind,
  type Role,
  type UserStatus,
} from '@skyledger/contracts';
import { Column, Entity, Index, PrimaryGeneratedColumn, VersionColumn } from 'typeorm';
import { CreatedAt, UpdatedAt, instantColumn } from '../../database/columns';

@Entity('users')
export class User {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stored lower-cased, so the unique index is case-insensitive in effect. */
  @Index('UQ_users_email', { unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ name: 'display_name', type: 'varchar', length: 120 })
  displayName: string;

  @Column({ type: 'enum', enum: roles })
  role: Role;

  @Column({ type: 'enum', enum: userStatuses, default: 'invited' })
  status: UserStatus;

  /** argon2id; null until the person accepts their invitation. */
  @Column({ name: 'password_hash', type: 'varchar', length: 255, nullable: true, select: false })
  passwordHash: string | null;

  @Column({ name: 'failed_sign_ins', type: 'int', unsigned: true, default: 0 })
  failedSignIns: number;

  @Column(instantColumn({ name: 'locked_until', nullable: true }))
  lockedUntil: Date | null;

  @Column(instantColumn({ name: 'last_sign_in_at', nullable: true }))
  lastSignInAt: Date | null;

  /** The kinds of notification mail this person turned off; null when none. */
  @Column({ name: 'notifications_off', type: 'json', nullable: true })
  notificationsOff: NotificationKind[] | null;

  @CreatedAt()
  createdAt: Date;

  @UpdatedAt()
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
