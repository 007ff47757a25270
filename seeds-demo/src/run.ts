import { SeedingContext } from '@skyledger/api/seeding';
import { newsroom } from './newsroom';
import { seedDemo } from './seed-demo';

/** Seeds the demo newsroom and its claims desk. Idempotent: what exists already is left as it is. */
async function main(): Promise<void> {
  const seeding = await SeedingContext.open();
  try {
    const { people, datasets, claims } = await seedDemo(seeding);
    console.info(
      `Demo newsroom (${newsroom.outlet}): ${people.created} of ${people.total} people, ` +
        `${datasets.created} of ${datasets.total} datasets and ` +
        `${claims.created} of ${claims.total} claims created, the rest already there.`,
    );
  } finally {
    await seeding.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
