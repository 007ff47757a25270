import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type SearchResponse } from '@skyledger/contracts';
import { SearchQueryDto } from './dto/search-query.dto';
import { SearchService } from './search.service';

@ApiTags('search')
@ApiBearerAuth()
@Controller('search')
export class SearchController {
  constructor(private readonly search: SearchService) {}

  /** The desk's search over claims, sources and explainers, with facets and highlights. */
  @Get()
  desk(@Query() query: SearchQueryDto): Promise<SearchResponse> {
    return this.search.desk(query);
  }
}
