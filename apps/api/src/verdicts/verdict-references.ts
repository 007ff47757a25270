import { citedSourceIds, embeddedWorkingIds } from '@skyledger/explainer';
import { type EntityManager } from 'typeorm';
import { ApiError } from '../common/errors/api-error';
import { VerdictVersion } from './entities/verdict-version.entity';

/** A working or a source of a claim, as a verdict version may show it. */
export type ShownPart = { kind: 'working'; id: string } | { kind: 'source'; id: string };

const shows = (version: VerdictVersion, part: ShownPart) =>
  part.kind === 'working'
    ? embeddedWorkingIds(version.body).includes(part.id)
    : citedSourceIds(version.body).includes(part.id) || version.primarySourceId === part.id;

/**
 * The earliest version of a claim's verdict that uses `part`, or null; with `sent`, only
 * versions sent for sign-off, which are kept as they were (a published one is on record,
 * and superseded ones stay readable), so what they embed and cite must not change.
 */
export async function versionUsing(
  manager: EntityManager,
  claimId: string,
  part: ShownPart,
  { sent = false } = {},
): Promise<Pick<VerdictVersion, 'number' | 'state'> | null> {
  const versions = await manager.find(VerdictVersion, {
    where: { claimId },
    select: { id: true, number: true, state: true, body: true, primarySourceId: true },
    order: { number: 'ASC' },
  });
  return (
    versions.find((version) => (!sent || version.state !== 'draft') && shows(version, part)) ?? null
  );
}

/**
 * Refuses to take a working or a source off a claim while a version of its verdict uses
 * it: a draft can drop it first; a version sent for sign-off keeps it for good.
 */
export async function assertNotInVerdict(
  manager: EntityManager,
  claimId: string,
  part: ShownPart,
): Promise<void> {
  const version = await versionUsing(manager, claimId, part);
  if (!version) return;
  const what = part.kind === 'working' ? 'this working' : 'this source';
  throw ApiError.conflict(
    version.state === 'draft'
      ? `The draft of version ${version.number} of the verdict uses ${what}: take it out of the draft first`
      : `Version ${version.number} of the verdict uses ${what}, and a version sent for sign-off is kept as it was: ${what} stays on the claim`,
    { [part.kind]: 'inUse' },
  );
}
