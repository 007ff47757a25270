import { CreateDateColumn, UpdateDateColumn, type ColumnOptions } from 'typeorm';

/**
 * Timestamp columns at millisecond precision. TypeORM's generator keeps proposing a
 * change unless the default names the same precision as the column (STACK.md).
 */
export const CreatedAt = (name = 'created_at') =>
  CreateDateColumn({ name, precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' });

export const UpdatedAt = (name = 'updated_at') =>
  UpdateDateColumn({
    name,
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  });

export const instantColumn = (options: ColumnOptions = {}): ColumnOptions => ({
  type: 'datetime',
  precision: 3,
  ...options,
});
