import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { Module, type DynamicModule } from '@nestjs/common';
import { coreImports } from '../app.module';
import { loadEnvFile } from '../config/load-env-file';
import { validateEnv } from '../config/env.schema';
import { SearchIndexService } from '../search/search-index.service';
import { SearchModule } from '../search/search.module';

@Module({})
class ReindexModule {
  static forRoot(): DynamicModule {
    return { module: ReindexModule, imports: [...coreImports(), SearchModule] };
  }
}

/**
 * `npm run search:reindex -w apps/api` rebuilds the search index from MariaDB. With
 * Meilisearch that is the shared index every API instance reads. The embedded index
 * lives inside the API process: it is rebuilt at every start, and a desk chief rebuilds
 * it on demand from the desk's search page (`POST /api/search/reindex`).
 */
async function main(): Promise<void> {
  loadEnvFile();
  process.env.OUTBOX_WORKER_ENABLED = 'false';
  process.env.LOG_LEVEL ??= 'warn';
  if (validateEnv(process.env).SEARCH_ENGINE === 'embedded') {
    console.info(
      'The embedded search index lives inside the API process: it is built from MariaDB at ' +
        'every start. To rebuild it while the API runs, a desk chief uses "Rebuild the index" ' +
        'on the search page (POST /api/search/reindex). Nothing to do here.',
    );
    return;
  }
  const context = await NestFactory.createApplicationContext(ReindexModule.forRoot(), {
    logger: ['error', 'warn'],
  });
  try {
    const started = Date.now();
    const count = await context.get(SearchIndexService).rebuild();
    console.info(`Search index rebuilt: ${count} documents in ${Date.now() - started} ms.`);
  } finally {
    await context.close();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
