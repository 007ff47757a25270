import { type EntityManager } from 'typeorm';
import { Appearance } from '../appearances/entities/appearance.entity';
import { type Claimant } from '../claimants/entities/claimant.entity';
import { type Claim } from '../claims/entities/claim.entity';
import { ClaimSource } from '../sources/entities/claim-source.entity';
import { type VerdictVersion } from './entities/verdict-version.entity';

type ClaimAsCleared = Pick<
  VerdictVersion,
  'claimText' | 'claimSummary' | 'claimantId' | 'clearedParts'
>;

/** The claim as it stands, for the version the copy desk is clearing to keep. */
export async function claimAsItStands(
  manager: EntityManager,
  claim: Claim,
): Promise<ClaimAsCleared> {
  const [appearances, links] = await Promise.all([
    manager.find(Appearance, { where: { claimId: claim.id }, select: { id: true } }),
    manager.find(ClaimSource, { where: { claimId: claim.id }, select: { sourceId: true } }),
  ]);
  return {
    claimText: claim.text,
    claimSummary: claim.summary,
    claimantId: claim.claimantId,
    clearedParts: {
      appearanceIds: appearances.map((appearance) => appearance.id),
      sourceIds: links.map((link) => link.sourceId),
    },
  };
}

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

/** Whether readers are shown this appearance or source with the version (all, for none kept). */
export function shownWith(
  version: Pick<VerdictVersion, 'clearedParts'>,
  part: keyof NonNullable<VerdictVersion['clearedParts']>,
): (id: string) => boolean {
  const ids = version.clearedParts?.[part];
  return ids ? (id) => ids.includes(id) : () => true;
}
