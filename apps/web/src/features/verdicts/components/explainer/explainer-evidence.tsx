import type { ClaimSourceView } from '@skyledger/contracts';
import { createContext, useContext } from 'react';
import type { WorkingsOnHand } from '../working-summary';

export interface ExplainerEvidence extends WorkingsOnHand {
  claimId: string;
  /** The claim's sources, which citations name by id. */
  sources: readonly ClaimSourceView[];
}

const EvidenceContext = createContext<ExplainerEvidence | null>(null);

/** What the editor's own nodes draw from: the claim's stored sources and workings. */
export const ExplainerEvidenceProvider = EvidenceContext.Provider;

export function useExplainerEvidence(): ExplainerEvidence {
  const evidence = useContext(EvidenceContext);
  if (!evidence) throw new Error('useExplainerEvidence needs an ExplainerEvidenceProvider');
  return evidence;
}
