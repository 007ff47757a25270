import { Column, Entity, PrimaryColumn, VersionColumn } from 'typeorm';
import { UpdatedAt } from '../../database/columns';

/** One level of the desk's rating scale. The default scale is seeded by a migration. */
@Entity('rating_levels')
export class RatingLevel {
  /** A stable id (`holds-up`) that verdicts refer to; the label can change, this cannot. */
  @PrimaryColumn({ type: 'varchar', length: 40 })
  id: string;

  /** Its number on the scale, higher = holds up better; null for an outcome that is not a rating. */
  @Column({ type: 'tinyint', unsigned: true, nullable: true })
  number: number | null;

  @Column({ type: 'varchar', length: 60 })
  label: string;

  @Column({ type: 'text' })
  description: string;

  @Column({ name: 'is_rating', type: 'boolean' })
  isRating: boolean;

  @UpdatedAt()
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
