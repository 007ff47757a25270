import { Controller, Get, HttpCode, HttpStatus, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type SearchReindexResponse, type SearchResponse } from '@skyledger/contracts';
import { Roles } from '../common/decorators/roles.decorator';
import { SearchIndexService } from './search-index.service';
import { SearchQueryDto } from './dto/search-query.dto';
import { SearchService } from './search.service';

@ApiTags('search')
@ApiBearerAuth()
@Controller('search')
export class SearchController {
  constructor(
    private readonly search: SearchService,
    private readonly index: SearchIndexService,
  ) {}

  /** The desk's search over claims, sources and explainers, with facets and highlights. */
  @Get()
  desk(@Query() query: SearchQueryDto): Promise<SearchResponse> {
    return this.search.desk(query);
  }

  /** Rebuilds this instance's index from MariaDB (the shared one, with Meilisearch). */
  @Post('reindex')
  @Roles('desk_chief')
  @HttpCode(HttpStatus.OK)
  async reindex(): Promise<SearchReindexResponse> {
    const started = Date.now();
    const documents = await this.index.rebuild();
    return { documents, milliseconds: Date.now() - started };
  }
}
