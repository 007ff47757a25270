import { type ClaimantView } from '@skyledger/contracts';
import { type Claimant } from './entities/claimant.entity';

export function toClaimantView(claimant: Claimant): ClaimantView {
  return {
    id: claimant.id,
    name: claimant.name,
    kind: claimant.kind,
    affiliation: claimant.affiliation,
    notes: claimant.notes,
    nameShownPublicly: claimant.kind !== 'private_individual' || claimant.nameShownPublicly,
    version: claimant.version,
  };
}
