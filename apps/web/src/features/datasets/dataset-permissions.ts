import type { Role } from '@skyledger/contracts';
import { claimRoles, hasClaimRole } from '@/features/claims/claim-permissions';

/** Every role reads datasets; those who research claims import them (as the API's @Roles). */
export const datasetImportRoles = claimRoles.research;

export function mayImportDataset(role: Role): boolean {
  return hasClaimRole(role, 'research');
}
