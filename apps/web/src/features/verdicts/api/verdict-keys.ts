export const verdictKeys = {
  all: ['verdicts'] as const,
  claims: () => [...verdictKeys.all, 'claim'] as const,
  /** Every version of one claim's verdict, with decisions and conflicts. */
  claim: (claimId: string) => [...verdictKeys.claims(), claimId] as const,
  /** The version awaiting sign-off, its checklist and whether I may decide. */
  signoff: (claimId: string) => [...verdictKeys.claim(claimId), 'signoff'] as const,
};
