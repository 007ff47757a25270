import { openDatabase } from '@skyledger/api/seeding';
import { deskDefaults, generateDesk, GeneratorRefusal } from './generator';
import { generateUsage, parseGenerateArgs, type GenerateArgs } from './generator/generate-args';

/**
 * Writes a large invented desk (people, claimants, sources, claims with their workings,
 * verdicts and published explainers) straight into the database named by the DB_*
 * variables, for scale tests and benchmarks. Never the demo.
 */
async function main(): Promise<number> {
  let args: GenerateArgs;
  try {
    args = parseGenerateArgs(process.argv.slice(2));
  } catch (error) {
    console.error(`${(error as Error).message}\n${generateUsage}`);
    return 2;
  }
  const dataSource = await openDatabase();
  try {
    const { written, seconds } = await generateDesk(dataSource, args);
    const counts = Object.entries(written)
      .map(([entity, count]) => `${count} ${entity}`)
      .join(', ');
    console.info(
      `Generated seed ${args.seed ?? deskDefaults.seed} into ${dataSource.options.database} in ` +
        `${seconds.toFixed(1)} s: ${counts}. All invented; restart the API (or reindex a shared ` +
        `search engine) so search finds them.`,
    );
    return 0;
  } catch (error) {
    if (error instanceof GeneratorRefusal) {
      console.error(error.message);
      return 1;
    }
    throw error;
  } finally {
    await dataSource.destroy();
  }
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
