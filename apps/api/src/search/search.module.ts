import { Module } from '@nestjs/common';
import { searchConfig, type SearchConfig } from '../config/configuration';
import { EmbeddedSearchEngine } from './engines/embedded-engine';
import { MeilisearchEngine } from './engines/meilisearch-engine';
import { SearchController } from './search.controller';
import { SearchDocumentsReader } from './search-documents.reader';
import { SearchEngine } from './search-engine';
import { SearchIndexService } from './search-index.service';
import { SearchService } from './search.service';

/** One search interface; `SEARCH_ENGINE` picks the engine behind it. */
@Module({
  controllers: [SearchController],
  providers: [
    {
      provide: SearchEngine,
      inject: [searchConfig.KEY],
      useFactory: (config: SearchConfig): SearchEngine =>
        config.engine === 'meilisearch'
          ? new MeilisearchEngine(config.meilisearch)
          : new EmbeddedSearchEngine(),
    },
    SearchDocumentsReader,
    SearchIndexService,
    SearchService,
  ],
  exports: [SearchIndexService, SearchService],
})
export class SearchModule {}
