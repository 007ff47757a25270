import type { ClaimDetail, CurrentUser, Role } from '@skyledger/contracts';

/**
 * Who may publish and who may reopen a published claim for a correction, as the API
 * enforces it (apps/api publishing.controller.ts and claim-life.service.ts).
 */
export const publishingRoles = {
  publish: ['copy_desk', 'desk_chief'],
  correct: ['science_editor', 'desk_chief'],
} as const satisfies Record<string, readonly Role[]>;

export function mayPublish(user: CurrentUser, claim: ClaimDetail): boolean {
  return (
    claim.status === 'cleared' && (publishingRoles.publish as readonly Role[]).includes(user.role)
  );
}

export function mayStartCorrection(user: CurrentUser, claim: ClaimDetail): boolean {
  return (
    claim.status === 'published' && (publishingRoles.correct as readonly Role[]).includes(user.role)
  );
}
