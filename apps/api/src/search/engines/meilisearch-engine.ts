import {
  Meilisearch,
  type EnqueuedTaskPromise,
  type Filter,
  type Hit,
  type Index,
  type IndexSwap,
} from 'meilisearch';
import { normaliseTerm } from '../normalise-term';
import {
  searchFieldNames,
  searchSynonyms,
  type SearchDocument,
  type SearchField,
} from '../search-document';
import {
  SearchEngine,
  type EngineFilters,
  type EngineHit,
  type EngineQuery,
  type EngineResult,
} from '../search-engine';

export interface MeilisearchOptions {
  host: string;
  apiKey?: string;
  index: string;
}

/** Settings applied at every boot, so the index always searches the way this code expects. */
export const meilisearchSettings = {
  // Meilisearch ranks attributes by their order here: the same order as the embedded boosts.
  searchableAttributes: searchFieldNames,
  filterableAttributes: ['type', 'status', 'topicList', 'rating', 'date', 'audience'],
  sortableAttributes: ['date'],
  synonyms: searchSynonyms,
  typoTolerance: { enabled: true, minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 } },
};

const quoted = (value: string) => JSON.stringify(value);

export function filterOf(filters: EngineFilters): Filter {
  const parts: string[] = [];
  if (filters.types) parts.push(`type IN [${filters.types.map(quoted).join(', ')}]`);
  if (filters.status) parts.push(`status = ${quoted(filters.status)}`);
  if (filters.topic) parts.push(`topicList = ${quoted(filters.topic)}`);
  if (filters.rating) parts.push(`rating = ${quoted(filters.rating)}`);
  if (filters.from !== undefined) parts.push(`date >= ${filters.from}`);
  if (filters.before !== undefined) parts.push(`date < ${filters.before}`);
  if (filters.audience) parts.push(`audience = ${quoted(filters.audience)}`);
  return parts.join(' AND ');
}

/** Meilisearch reports matches as UTF-8 byte ranges. */
function matchedTerms(hit: Hit<SearchDocument>): EngineHit['matchedTerms'] {
  const terms: EngineHit['matchedTerms'] = {};
  for (const [field, positions] of Object.entries(hit._matchesPosition ?? {})) {
    const value = hit[field as keyof SearchDocument];
    if (typeof value !== 'string') continue;
    const bytes = Buffer.from(value);
    terms[field as SearchField] = (positions ?? []).map(({ start, length }) =>
      normaliseTerm(bytes.subarray(start, start + length).toString()),
    );
  }
  return terms;
}

/** Waits for a task, and makes one that did not succeed an error: the client returns it either way. */
async function finished(enqueued: EnqueuedTaskPromise): Promise<void> {
  const task = await enqueued.waitTask();
  if (task.status !== 'succeeded') {
    throw new Error(
      `Meilisearch task ${task.uid} (${task.type}) ${task.status}: ${task.error?.message ?? 'no reason given'}`,
    );
  }
}

/** The engine for several API instances: one Meilisearch index they all share. */
export class MeilisearchEngine extends SearchEngine {
  readonly persistent = true;
  private readonly client: Meilisearch;
  private readonly index: Index<SearchDocument>;

  constructor(private readonly options: MeilisearchOptions) {
    super();
    this.client = new Meilisearch({ host: options.host, apiKey: options.apiKey });
    this.index = this.client.index<SearchDocument>(options.index);
  }

  async start(): Promise<void> {
    const indexes = await this.client.getIndexes({ limit: 1000 });
    if (!indexes.results.some((index) => index.uid === this.options.index)) {
      await finished(this.client.createIndex(this.options.index, { primaryKey: 'id' }));
    }
    await finished(this.index.updateSettings(meilisearchSettings));
  }

  /**
   * Fills a second index and swaps it in, so searches meanwhile see the whole of the
   * old one, never a half-filled index; the old documents go with the second index.
   */
  async replaceAll(documents: SearchDocument[]): Promise<void> {
    const staging = `${this.options.index}_rebuild`;
    // Left behind by a rebuild that stopped half-way, if any.
    await this.client.deleteIndexIfExists(staging);
    await finished(this.client.createIndex(staging, { primaryKey: 'id' }));
    const next = this.client.index<SearchDocument>(staging);
    await finished(next.updateSettings(meilisearchSettings));
    for (let start = 0; start < documents.length; start += 10_000) {
      await finished(next.addDocuments(documents.slice(start, start + 10_000)));
    }
    // `rename` (Meilisearch 1.18) is left out: a swap is what it means when absent, and an
    // older server may refuse a field it does not know.
    const swap = { indexes: [this.options.index, staging] } as IndexSwap;
    await finished(this.client.swapIndexes([swap]));
    await finished(this.client.deleteIndex(staging));
  }

  async upsert(documents: SearchDocument[]): Promise<void> {
    if (documents.length) await finished(this.index.addDocuments(documents));
  }

  async remove(ids: string[]): Promise<void> {
    if (ids.length) await finished(this.index.deleteDocuments(ids));
  }

  async count(): Promise<number> {
    return (await this.index.getStats()).numberOfDocuments;
  }

  async search(query: EngineQuery): Promise<EngineResult> {
    const response = await this.index.search(query.q, {
      filter: filterOf(query.filters),
      facets: query.match === 'all' ? ['type', 'status', 'topicList'] : [],
      offset: query.offset,
      limit: query.limit,
      showMatchesPosition: true,
      showRankingScore: true,
      matchingStrategy: query.match === 'all' ? 'all' : 'frequency',
    });
    const facets = response.facetDistribution ?? {};
    return {
      hits: response.hits.map((hit) => ({
        document: hit,
        score: hit._rankingScore ?? 0,
        matchedTerms: matchedTerms(hit),
      })),
      total: response.estimatedTotalHits ?? response.hits.length,
      facets: {
        type: facets.type ?? {},
        status: facets.status ?? {},
        topics: facets.topicList ?? {},
      },
    };
  }
}
