import { type Claimant } from '../claimants/entities/claimant.entity';
import { type Claim } from '../claims/entities/claim.entity';
import { type VerdictVersion } from './entities/verdict-version.entity';

/**
 * The claim as readers are shown it with a verdict version: as the copy desk cleared it,
 * not as the desk may have edited it since for a correction. A version is given it when
 * cleared; the claim itself stands in for a version that has none.
 */
export function claimAsCleared(
  claim: Pick<Claim, 'text' | 'summary'>,
  version: Partial<Pick<VerdictVersion, 'claimText' | 'claimSummary'>>,
): { text: string; summary: string } {
  return { text: version.claimText ?? claim.text, summary: version.claimSummary ?? claim.summary };
}

/** Who said it, as cleared with the version; needs both claimants loaded. */
export function claimantAsCleared(
  claim: { claimant: Claimant },
  version: { claimant?: Claimant | null },
): Claimant {
  return version.claimant ?? claim.claimant;
}
