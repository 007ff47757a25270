import slugify from 'slugify';
import { Not, type EntityManager } from 'typeorm';
import { Claim } from '../claims/entities/claim.entity';

const MAX_LENGTH = 80;

/**
 * A readable, stable address part for a claim's explainer, from its summary as cleared,
 * unique across the desk.
 */
export async function uniqueSlug(
  manager: EntityManager,
  claimId: string,
  summary: string,
): Promise<string> {
  const base =
    slugify(summary, { lower: true, strict: true, locale: 'en' })
      .slice(0, MAX_LENGTH)
      .replace(/-+$/, '') || 'explainer';
  for (let n = 1; ; n += 1) {
    const candidate = n === 1 ? base : `${base}-${n}`;
    if (!(await manager.existsBy(Claim, { slug: candidate, id: Not(claimId) }))) return candidate;
  }
}
