import { type SeedingContext } from '@skyledger/api/seeding';
import { demoClaims } from './claims-desk/claims';
import { demoDatasets } from './datasets/demo-datasets';
import { newsroom } from './newsroom';

export interface DemoSeedResult {
  people: { created: number; total: number };
  datasets: { created: number; total: number };
  claims: { created: number; total: number };
}

/**
 * The whole demo scenario, in the order it depends on: the people, the (synthetic)
 * datasets, then the claims they file and research, workings included. Idempotent: what exists already is left as it is.
 */
export async function seedDemo(seeding: SeedingContext): Promise<DemoSeedResult> {
  let people = 0;
  for (const person of newsroom.people) {
    if ((await seeding.person(person, newsroom.password)).created) people += 1;
  }
  let datasets = 0;
  for (const dataset of demoDatasets) {
    if ((await seeding.dataset(dataset)).created) datasets += 1;
  }
  let claims = 0;
  for (const claim of demoClaims) {
    if ((await seeding.claim(claim)).created) claims += 1;
  }
  return {
    people: { created: people, total: newsroom.people.length },
    datasets: { created: datasets, total: demoDatasets.length },
    claims: { created: claims, total: demoClaims.length },
  };
}
