import MiniSearch, { type Query, type SearchResult } from 'minisearch';
import {
  type SearchDocument,
  searchFieldNames,
  searchFields,
  searchSynonyms,
} from '../search-document';
import { type SearchField } from '../search-document';
import {
  SearchEngine,
  type EngineFilters,
  type EngineHit,
  type EngineQuery,
  type EngineResult,
} from '../search-engine';
import { normaliseTerm, wordsOf } from '../normalise-term';

/**
 * Typos forgiven per word: none below five letters, where one typo is often another word
 * ("core" and "more"); the same thresholds as Meilisearch's defaults.
 */
export const typoAllowance = (term: string) => (term.length >= 9 ? 2 : term.length >= 5 ? 1 : 0);

/** Prefix matching from three letters on, for type-ahead. */
export const prefixAllowed = (term: string) => term.length >= 3;

function matches(document: SearchDocument, filters: EngineFilters): boolean {
  if (filters.types && !filters.types.includes(document.type)) return false;
  if (filters.status && document.status !== filters.status) return false;
  if (filters.topic && !document.topicList.includes(filters.topic)) return false;
  if (filters.rating && document.rating !== filters.rating) return false;
  if (filters.from !== undefined && document.date < filters.from) return false;
  if (filters.before !== undefined && document.date >= filters.before) return false;
  if (filters.audience && document.audience !== filters.audience) return false;
  return true;
}

/** Each word of the query, or one of its synonyms. */
function queryOf(q: string, match: EngineQuery['match']): Query {
  const terms = [...new Set(wordsOf(q))];
  return {
    combineWith: match === 'all' ? 'AND' : 'OR',
    queries: terms.map((term) => ({
      combineWith: 'OR',
      queries: [
        term,
        // A synonym is a word the desk chose: it matches as written, not with typos.
        ...(searchSynonyms[term] ?? []).map((synonym) => ({
          queries: [synonym],
          fuzzy: false,
          prefix: false,
        })),
      ],
    })),
  };
}

function count(into: Record<string, number>, key: string | null) {
  if (key) into[key] = (into[key] ?? 0) + 1;
}

/**
 * The embedded engine: a MiniSearch index in the API's memory, built from MariaDB at
 * boot and updated on every write. Right for one API process; several need Meilisearch.
 */
export class EmbeddedSearchEngine extends SearchEngine {
  readonly persistent = false;
  private readonly documents = new Map<string, SearchDocument>();
  private index = this.emptyIndex();

  private emptyIndex() {
    return new MiniSearch<SearchDocument>({
      fields: searchFieldNames,
      storeFields: [],
      processTerm: (term) => normaliseTerm(term) || null,
      searchOptions: {
        boost: searchFields,
        fuzzy: typoAllowance,
        prefix: prefixAllowed,
        processTerm: (term) => normaliseTerm(term) || null,
      },
    });
  }

  start(): Promise<void> {
    return Promise.resolve();
  }

  replaceAll(documents: SearchDocument[]): Promise<void> {
    this.documents.clear();
    this.index = this.emptyIndex();
    for (const document of documents) this.documents.set(document.id, document);
    this.index.addAll(documents);
    return Promise.resolve();
  }

  upsert(documents: SearchDocument[]): Promise<void> {
    for (const document of documents) {
      if (this.index.has(document.id)) this.index.replace(document);
      else this.index.add(document);
      this.documents.set(document.id, document);
    }
    return Promise.resolve();
  }

  remove(ids: string[]): Promise<void> {
    for (const id of ids) {
      if (!this.index.has(id)) continue;
      this.index.discard(id);
      this.documents.delete(id);
    }
    return Promise.resolve();
  }

  count(): Promise<number> {
    return Promise.resolve(this.documents.size);
  }

  search(query: EngineQuery): Promise<EngineResult> {
    const results = this.index.search(queryOf(query.q, query.match), {
      filter: (result) => {
        const document = this.documents.get(result.id as string);
        return document !== undefined && matches(document, query.filters);
      },
    });
    const facets: EngineResult['facets'] = { type: {}, status: {}, topics: {} };
    for (const result of results) {
      const document = this.documents.get(result.id as string)!;
      count(facets.type, document.type);
      count(facets.status, document.status);
      for (const topic of document.topicList) count(facets.topics, topic);
    }
    const page = results
      .sort((a, b) => b.score - a.score || this.dateOf(b) - this.dateOf(a))
      .slice(query.offset, query.offset + query.limit);
    return Promise.resolve({
      hits: page.map((result) => this.hitOf(result)),
      total: results.length,
      facets,
    });
  }

  private dateOf(result: SearchResult): number {
    return this.documents.get(result.id as string)?.date ?? 0;
  }

  private hitOf(result: SearchResult): EngineHit {
    const matchedTerms: EngineHit['matchedTerms'] = {};
    for (const [term, fields] of Object.entries(result.match)) {
      for (const field of fields as SearchField[]) (matchedTerms[field] ??= []).push(term);
    }
    return {
      document: this.documents.get(result.id as string)!,
      score: result.score,
      matchedTerms,
    };
  }
}
