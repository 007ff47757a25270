export const workingKeys = {
  all: ['workings'] as const,
  claims: () => [...workingKeys.all, 'claim'] as const,
  claim: (claimId: string) => [...workingKeys.claims(), claimId] as const,
  calculators: () => [...workingKeys.all, 'calculators'] as const,
};
