import { type ConsultationView } from '@skyledger/contracts';
import { toPersonRef } from '../common/views/person-ref';
import { type ExpertConsultation } from './entities/expert-consultation.entity';

/** Needs `createdBy` loaded. */
export function toConsultationView(consultation: ExpertConsultation): ConsultationView {
  return {
    id: consultation.id,
    name: consultation.name,
    affiliation: consultation.affiliation,
    field: consultation.field,
    quote: consultation.quote,
    consultedOn: consultation.consultedOn,
    declaredConflicts: consultation.declaredConflicts,
    independentOfClaimant: consultation.independentOfClaimant,
    loggedBy: toPersonRef(consultation.createdBy),
    createdAt: consultation.createdAt.toISOString(),
    version: consultation.version,
  };
}
