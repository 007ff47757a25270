import { Column, Entity, Index } from 'typeorm';
import { ClaimPart } from '../../claims/entities/claim-part';

/** An independent expert the desk consulted on a claim, with what they declared. */
@Entity('expert_consultations')
@Index('IDX_expert_consultations_claim', ['claimId', 'consultedOn'])
export class ExpertConsultation extends ClaimPart {
  @Column({ type: 'varchar', length: 160 })
  name: string;

  @Column({ type: 'varchar', length: 200 })
  affiliation: string;

  @Column({ type: 'varchar', length: 160 })
  field: string;

  @Column({ type: 'text' })
  quote: string;

  @Column({ name: 'consulted_on', type: 'date' })
  consultedOn: string;

  @Column({ name: 'declared_conflicts', type: 'text' })
  declaredConflicts: string;

  @Column({ name: 'independent_of_claimant', type: 'boolean' })
  independentOfClaimant: boolean;
}
