import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { Relation } from 'typeorm';
import { Attachment } from '../../attachments/entities/attachment.entity';
import { AuthoredRecord } from '../../database/authored-record';

export interface DatasetColumnSpec {
  /** The CSV header it was read from. */
  key: string;
  label: string;
  unit: string;
}

/** One parsed row: time as a decimal year, then a value per column in `columns` order. */
export type DatasetRow = [t: number, ...values: number[]];

/**
 * A time series table on the desk: the CSV as uploaded (an attachment) plus its rows,
 * parsed and typed once, which trend and comparison workings read.
 */
@Entity('datasets')
@Index('IDX_datasets_name', ['name'])
export class Dataset extends AuthoredRecord {
  @Column({ type: 'varchar', length: 160 })
  name: string;

  @Column({ type: 'text' })
  description: string;

  @Column({ name: 'attachment_id', type: 'uuid' })
  attachmentId: string;

  @ManyToOne(() => Attachment, { nullable: false })
  @JoinColumn({ name: 'attachment_id' })
  attachment: Relation<Attachment>;

  @Column({ name: 'time_column', type: 'varchar', length: 120 })
  timeColumn: string;

  @Column({ type: 'json' })
  columns: DatasetColumnSpec[];

  @Column({ type: 'json' })
  rows: DatasetRow[];

  @Column({ name: 'row_count', type: 'int', unsigned: true })
  rowCount: number;
}
