import { Column, JoinColumn, ManyToOne, PrimaryGeneratedColumn, VersionColumn } from 'typeorm';
import { User } from '../users/entities/user.entity';
import { CreatedAt, UpdatedAt } from './columns';

/**
 * What every record a person adds and editors change has: an id, who added it, when,
 * and a version for optimistic locking. Each subclass is a table of its own.
 */
export abstract class AuthoredRecord {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'created_by_id', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'created_by_id' })
  createdBy: User;

  @CreatedAt()
  createdAt: Date;

  @UpdatedAt()
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
