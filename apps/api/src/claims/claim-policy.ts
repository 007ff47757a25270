import { HttpStatus } from '@nestjs/common';
import { type Role } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { type Claim } from './entities/claim.entity';

/**
 * Who may do what to a claim, from the roles table of PRODUCT.md. Every rule is enforced
 * here, on the server; the desk only hides what these refuse.
 */
export const claimRoles = {
  /** File claims and add appearances, sources and attachments. */
  contribute: ['reporter', 'science_editor', 'desk_chief'],
  /** Research: reply attempts and expert consultations. */
  research: ['science_editor', 'desk_chief'],
  /** Comment: anyone on the desk. */
  comment: ['reporter', 'science_editor', 'copy_desk', 'desk_chief'],
  /** May be given a claim to research. */
  assignable: ['science_editor', 'desk_chief'],
} as const satisfies Record<string, readonly Role[]>;

export function hasRole(actor: AuthenticatedUser, allowed: readonly Role[]): boolean {
  return allowed.includes(actor.role);
}

export function forbidden(message: string): ApiError {
  return new ApiError(HttpStatus.FORBIDDEN, message);
}

/**
 * A reporter edits the claims they filed while those are still `filed`; science editors
 * and desk chiefs edit any claim until it is published or set aside.
 */
export function assertMayEditClaim(actor: AuthenticatedUser, claim: Claim): void {
  if (claim.status === 'published' || claim.status === 'set_aside') {
    throw ApiError.unprocessable(
      claim.status === 'published'
        ? 'A published claim changes only through a correction'
        : 'A claim that was set aside can no longer be edited',
      { status: claim.status },
    );
  }
  if (actor.role === 'science_editor' || actor.role === 'desk_chief') return;
  if (actor.role === 'reporter' && claim.filedById === actor.id && claim.status === 'filed') return;
  throw forbidden(
    actor.role === 'reporter'
      ? 'Reporters may edit only the claims they filed, and only until research starts'
      : 'Only the reporter who filed it, a science editor or a desk chief may edit a claim',
  );
}

/** A record under a claim is changed by whoever added it, or by a science editor or desk chief. */
export function assertMayChangePart(
  actor: AuthenticatedUser,
  part: { createdById: string },
  what: string,
): void {
  if (part.createdById === actor.id || hasRole(actor, claimRoles.research)) return;
  throw forbidden(
    `Only whoever added this ${what}, a science editor or a desk chief may change it`,
  );
}
