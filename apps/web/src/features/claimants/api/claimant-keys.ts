export const claimantKeys = {
  all: ['claimants'] as const,
  searches: () => [...claimantKeys.all, 'search'] as const,
  search: (q: string) => [...claimantKeys.searches(), q] as const,
};
