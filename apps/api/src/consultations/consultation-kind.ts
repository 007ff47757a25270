import { type ConsultationView } from '@skyledger/contracts';
import { type ClaimPartKind } from '../claims/claim-part-kind';
import { claimRoles } from '../claims/claim-policy';
import { toConsultationView } from './consultation-view';
import { ExpertConsultation } from './entities/expert-consultation.entity';

export const consultationKind: ClaimPartKind<ExpertConsultation, ConsultationView> = {
  entity: ExpertConsultation,
  name: 'consultation',
  addRoles: claimRoles.research,
  toView: toConsultationView,
  summarise: (consultation) => ({
    name: consultation.name,
    affiliation: consultation.affiliation,
    independentOfClaimant: consultation.independentOfClaimant,
  }),
};
