import {
  reliabilityGrades,
  sourceKinds,
  type ReliabilityGrade,
  type SourceKind,
} from '@skyledger/contracts';
import { Column, Entity, Index } from 'typeorm';
import { AuthoredRecord } from '../../database/authored-record';

/** A piece of evidence with its citation and grade; one source can serve several claims. */
@Entity('sources')
@Index('IDX_sources_doi', ['doi'])
@Index('IDX_sources_title', ['title'])
export class Source extends AuthoredRecord {
  @Column({ type: 'varchar', length: 300 })
  title: string;

  @Column({ type: 'varchar', length: 500, nullable: true })
  authors: string | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  publisher: string | null;

  @Column({ type: 'smallint', unsigned: true, nullable: true })
  year: number | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  doi: string | null;

  @Column({ type: 'varchar', length: 2048, nullable: true })
  url: string | null;

  @Column({ name: 'accessed_on', type: 'date', nullable: true })
  accessedOn: string | null;

  @Column({ type: 'enum', enum: sourceKinds })
  kind: SourceKind;

  @Column({ type: 'enum', enum: reliabilityGrades })
  grade: ReliabilityGrade;

  @Column({ name: 'grade_reason', type: 'text' })
  gradeReason: string;
}
