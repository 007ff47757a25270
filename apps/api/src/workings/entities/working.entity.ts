import { Column, Entity, Index } from 'typeorm';
import { ClaimPart } from '../../claims/entities/claim-part';
import { instantColumn } from '../../database/columns';

/** Where a series input of a working came from: a column of a dataset on the desk. */
export interface DatasetSeriesRef {
  dataset: string;
  column: string;
  name?: string;
}

/**
 * One saved run of a calculator on a claim. Everything but the note is the server's own
 * run of @skyledger/calc on `inputs`: nothing computed by a client is ever stored.
 */
@Entity('workings')
@Index('IDX_workings_claim', ['claimId', 'createdAt'])
export class Working extends ClaimPart {
  @Column({ name: 'calculator_id', type: 'varchar', length: 64 })
  calculatorId: string;

  @Column({ name: 'library_version', type: 'varchar', length: 32 })
  libraryVersion: string;

  /** Every input used, given or default, in the declared units, as the library recorded them. */
  @Column({ type: 'json' })
  inputs: Record<string, unknown>;

  /** Series inputs that were read from datasets, by input name. */
  @Column({ name: 'dataset_refs', type: 'json', nullable: true })
  datasetRefs: Record<string, DatasetSeriesRef[]> | null;

  @Column({ type: 'json' })
  outputs: Record<string, unknown>;

  @Column({ type: 'json' })
  steps: unknown[];

  @Column({ type: 'json' })
  cautions: string[];

  @Column({ name: 'monte_carlo', type: 'json', nullable: true })
  monteCarlo: Record<string, unknown> | null;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  /** When the server last ran it again with the library then current. */
  @Column(instantColumn({ name: 'checked_at', nullable: true }))
  checkedAt: Date | null;
}
