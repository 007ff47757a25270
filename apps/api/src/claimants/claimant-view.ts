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

/**
 * What readers may see of a claimant: a private individual's name only when allowed. Also
 * what the explainer template names, so an unedited template cannot publish the name.
 */
export function claimantForReaders(claimant: Claimant) {
  const hidden = claimant.kind === 'private_individual' && !claimant.nameShownPublicly;
  return {
    name: hidden ? null : claimant.name,
    displayName: hidden ? 'A private individual' : claimant.name,
    kind: claimant.kind,
    affiliation: hidden ? null : claimant.affiliation,
  };
}
