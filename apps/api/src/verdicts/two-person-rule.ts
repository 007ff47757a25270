import { type AuthenticatedUser } from '../auth/authenticated-user';
import { type VerdictVersion } from './entities/verdict-version.entity';

/**
 * Why the actor may not decide on this version, or null when they may: nobody signs off
 * a version they drafted or last edited.
 */
export function twoPersonRuleRefusal(
  actor: AuthenticatedUser,
  version: Pick<VerdictVersion, 'createdById' | 'lastEditedById'>,
): string | null {
  if (version.createdById === actor.id)
    return 'You drafted this version: someone else signs it off';
  if (version.lastEditedById === actor.id) {
    return 'You edited this version last: someone else signs it off';
  }
  return null;
}
