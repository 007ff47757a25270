import { type Role } from '@skyledger/contracts';
import { type EntityManager } from 'typeorm';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { type Claim } from './entities/claim.entity';
import { type ClaimPart } from './entities/claim-part';

/**
 * How one kind of record under a claim (appearance, reply attempt, consultation,
 * comment) is added, changed and removed. ClaimPartsService does the common work
 * (locking, versions, permissions, audit); a kind states only what differs.
 */
export interface ClaimPartKind<Part extends ClaimPart, View> {
  entity: new () => Part;
  /** Singular noun for messages and audit actions (`appearance` → `appearance.added`). */
  name: string;
  /** Roles that may add one. */
  addRoles: readonly Role[];
  toView(part: Part): View;
  /** May throw to refuse a change; the default lets the adder, science editors and desk chiefs. */
  assertMayChange?(actor: AuthenticatedUser, part: Part): void;
  assertMayRemove?(actor: AuthenticatedUser, part: Part): void;
  /** Last checks and knock-on changes, in the transaction, before the part is saved. */
  beforeSave?(manager: EntityManager, claim: Claim, part: Part): Promise<void>;
  /** Last checks, in the transaction, before the part is removed; may throw to refuse. */
  beforeRemove?(manager: EntityManager, claim: Claim, part: Part): Promise<void>;
  /** What the audit event records of a new part. */
  summarise(part: Part): Record<string, unknown>;
}
