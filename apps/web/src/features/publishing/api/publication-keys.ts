export const publicationKeys = {
  all: ['publications'] as const,
  claims: () => [...publicationKeys.all, 'claim'] as const,
  /** A claim's publications, latest first: scheduled, published and cancelled. */
  claim: (claimId: string) => [...publicationKeys.claims(), claimId] as const,
};
