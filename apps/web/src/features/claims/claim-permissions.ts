import {
  openClaimStatuses,
  type ClaimDetail,
  type ClaimStatus,
  type CurrentUser,
  type Role,
} from '@skyledger/contracts';

/**
 * Who may do what to a claim, as the API enforces it (apps/api claim-policy.ts, from the
 * roles table of PRODUCT.md). The desk only hides what the server would refuse.
 */
export const claimRoles = {
  /** File claims and add appearances, sources and evidence files. */
  contribute: ['reporter', 'science_editor', 'desk_chief'],
  /** Log reply attempts and expert consultations. */
  research: ['science_editor', 'desk_chief'],
  comment: ['reporter', 'science_editor', 'copy_desk', 'desk_chief'],
  /** May be given a claim to research. */
  assignable: ['science_editor', 'desk_chief'],
} as const satisfies Record<string, readonly Role[]>;

export type ClaimAbility = keyof typeof claimRoles;

export function hasClaimRole(role: Role, ability: ClaimAbility): boolean {
  return (claimRoles[ability] as readonly Role[]).includes(role);
}

export function isOpen(status: ClaimStatus): boolean {
  return (openClaimStatuses as readonly ClaimStatus[]).includes(status);
}

/** A reporter edits their own claim while it is filed; editors and chiefs any open claim. */
export function mayEditClaim(user: CurrentUser, claim: ClaimDetail): boolean {
  if (!isOpen(claim.status)) return false;
  if (user.role === 'science_editor' || user.role === 'desk_chief') return true;
  return user.role === 'reporter' && claim.filedBy.id === user.id && claim.status === 'filed';
}

/** A science editor takes an open claim nobody has yet. */
export function mayTakeClaim(user: CurrentUser, claim: ClaimDetail): boolean {
  return user.role === 'science_editor' && isOpen(claim.status) && claim.assignee === null;
}

/** Only a desk chief gives a claim to someone else, or takes it off them. */
export function mayAssignClaim(user: CurrentUser, claim: ClaimDetail): boolean {
  return user.role === 'desk_chief' && isOpen(claim.status);
}

export function maySetAside(user: CurrentUser, claim: ClaimDetail): boolean {
  return user.role === 'desk_chief' && isOpen(claim.status);
}

/** A record under a claim is changed by whoever added it, or by a science editor or chief. */
export function mayChangePart(user: CurrentUser, addedBy: { id: string }): boolean {
  return addedBy.id === user.id || hasClaimRole(user.role, 'research');
}
