import { Inject, Injectable } from '@nestjs/common';
import {
  SEARCH_PAGE_SIZE,
  type SearchHit,
  type SearchResponse,
  type SimilarClaim,
} from '@skyledger/contracts';
import { appConfig, type AppConfig } from '../config/configuration';
import { explainerUrl } from '../publishing/publication-view';
import { highlight, snippet } from './highlight';
import { SearchDocumentsReader } from './search-documents.reader';
import { type SearchField } from './search-document';
import { SearchEngine, type EngineFilters, type EngineHit } from './search-engine';
import { type SearchQueryDto } from './dto/search-query.dto';

const SIMILAR_LIMIT = 5;
/** Similar claims below this share of the best score are noise. */
const SIMILAR_RELATIVE_FLOOR = 0.35;

const dayAfter = (date: string) => Date.parse(`${date}T00:00:00Z`) + 86_400_000;

function termsOf(hit: EngineHit, fields: SearchField[]): Set<string> {
  return new Set(fields.flatMap((field) => hit.matchedTerms[field] ?? []));
}

/** Where a snippet is cut from: the first of these longer fields in which a word matched. */
const snippetFields = ['text', 'body', 'authors', 'claimant'] as const;

function toSearchHit(hit: EngineHit): SearchHit {
  const { document } = hit;
  const field = snippetFields.find((name) => document[name] && termsOf(hit, [name]).size > 0);
  return {
    type: document.type,
    id: document.entityId,
    title: highlight(document.title, termsOf(hit, ['title'])),
    snippet: field ? snippet(document[field], termsOf(hit, [field])) : null,
    status: document.status,
    topics: document.topicList,
    rating: document.rating,
    date: new Date(document.date).toISOString(),
    score: hit.score,
  };
}

/** The desk's search, the reader search and similar claims, over the configured engine. */
@Injectable()
export class SearchService {
  constructor(
    private readonly engine: SearchEngine,
    private readonly documents: SearchDocumentsReader,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
  ) {}

  /** Everything on the desk: claims, sources and explainers, with facets and highlights. */
  desk(query: SearchQueryDto): Promise<SearchResponse> {
    return this.run(query, {});
  }

  /** Readers find published explainers and nothing else. */
  reader(query: SearchQueryDto): Promise<SearchResponse> {
    return this.run({ ...query, type: 'explainer' }, { audience: 'public' });
  }

  /**
   * The closest earlier claims to a text being typed, set-aside ones included: a claim
   * set aside as a duplicate still tells the reporter the desk has seen it. A published
   * one comes with its rating and the address of its explainer.
   */
  async similarClaims(text: string): Promise<SimilarClaim[]> {
    const result = await this.engine.search({
      q: text,
      filters: { types: ['claim'] },
      offset: 0,
      limit: SIMILAR_LIMIT,
      match: 'any',
    });
    const best = result.hits[0]?.score ?? 0;
    const hits = result.hits.filter((hit) => hit.score >= best * SIMILAR_RELATIVE_FLOOR);
    const published = hits
      .filter((hit) => hit.document.status === 'published')
      .map((hit) => hit.document.entityId);
    const explainers = new Map(
      (await this.documents.liveExplainers(published)).map((live) => [live.claimId, live]),
    );
    return hits.map(({ document, score }) => {
      const explainer = explainers.get(document.entityId);
      return {
        id: document.entityId,
        summary: document.title,
        status: document.status!,
        claimantName: document.claimant,
        filedAt: new Date(document.date).toISOString(),
        rating: explainer?.ratingId ?? null,
        explainerUrl: explainer ? explainerUrl(this.app.appUrl, explainer.slug) : null,
        score,
      };
    });
  }

  private async run(query: SearchQueryDto, fixed: EngineFilters): Promise<SearchResponse> {
    const page = query.page ?? 1;
    const result = await this.engine.search({
      q: query.q,
      filters: {
        ...(query.type ? { types: [query.type] } : {}),
        ...(query.status ? { status: query.status } : {}),
        ...(query.topic ? { topic: query.topic } : {}),
        ...(query.rating ? { rating: query.rating } : {}),
        ...(query.from ? { from: Date.parse(`${query.from}T00:00:00Z`) } : {}),
        ...(query.to ? { before: dayAfter(query.to) } : {}),
        ...fixed,
      },
      offset: (page - 1) * SEARCH_PAGE_SIZE,
      limit: SEARCH_PAGE_SIZE,
      match: 'all',
    });
    return {
      items: result.hits.map(toSearchHit),
      total: result.total,
      page,
      pageSize: SEARCH_PAGE_SIZE,
      facets: result.facets,
    };
  }
}
