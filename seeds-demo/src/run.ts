import { SeedingContext } from '@skyledger/api/seeding';
import { newsroom } from './newsroom';

/** Seeds the demo newsroom. Idempotent: what exists already is left as it is. */
async function main(): Promise<void> {
  const seeding = await SeedingContext.open();
  try {
    let created = 0;
    for (const person of newsroom.people) {
      if ((await seeding.person(person, newsroom.password)).created) created += 1;
    }
    console.info(
      `Demo newsroom (${newsroom.outlet}): ${created} of ${newsroom.people.length} people created, the rest already there.`,
    );
  } finally {
    await seeding.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
