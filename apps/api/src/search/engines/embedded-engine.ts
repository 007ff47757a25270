import {
  type SearchDocument,
  type SearchField,
  searchFieldNames,
  searchFields,
  searchSynonyms,
} from '../search-document';
import {
  SearchEngine,
  type EngineHit,
  type EngineQuery,
  type EngineResult,
} from '../search-engine';
import { wordsOf } from '../normalise-term';
import { CompactIndex, type TermGroup } from './compact-index';
import { SlotColumns } from './slot-columns';

/**
 * Typos forgiven per word: none below five letters, where one typo is often another word
 * ("core" and "more"); the same thresholds as Meilisearch's defaults.
 */
export const typoAllowance = (term: string) => (term.length >= 9 ? 2 : term.length >= 5 ? 1 : 0);

/**
 * Prefix matching from three letters on, for type-ahead: of the query's last word only,
 * the one still being typed, as Meilisearch matches. A word followed by others is whole;
 * matched as a prefix, a typed sentence's "car" also found every claim about carbon.
 */
export const prefixAllowed = (term: string, last: boolean) => last && term.length >= 3;

/**
 * Little words, matched only as written when a claim is typed in full for similar claims.
 * Their typos and the words they begin ("the": there, their, thermometers…) matched
 * nearly every claim, and ranking all of them made similar claims slow (npm run bench);
 * as written they still count towards how alike two phrasings are.
 */
const stopWords = new Set(
  (
    'a about after all also an and any are as at be been before being but by can could did do ' +
    'does for from had has have he her his how i if in into is it its just more most much my ' +
    'no nor not now of on only or our out over said says she since so some such than that the ' +
    'their them then there these they this those to too up us very was we were what when ' +
    'where which while who why will with would you your'
  ).split(' '),
);

const fieldsOf = (document: SearchDocument) => searchFieldNames.map((field) => document[field]);
const boosts = searchFieldNames.map((field) => searchFields[field]);

interface Ranked {
  slot: number;
  score: number;
  date: number;
}

/** Best first; among equal scores the newest, then the first indexed. */
const better = (a: Ranked, b: Ranked) => a.score - b.score || a.date - b.date || b.slot - a.slot;

/**
 * The best `size` of what is offered, kept in a min-heap (the worst kept on top), so a
 * page is picked from tens of thousands of matches without sorting them.
 */
class BestOf {
  private readonly heap: Ranked[] = [];

  constructor(private readonly size: number) {}

  offer(slot: number, score: number, date: number): void {
    const heap = this.heap;
    if (heap.length < this.size) {
      heap.push({ slot, score, date });
      for (let i = heap.length - 1; i > 0;) {
        const parent = (i - 1) >> 1;
        if (better(heap[parent]!, heap[i]!) <= 0) break;
        [heap[parent], heap[i]] = [heap[i]!, heap[parent]!];
        i = parent;
      }
      return;
    }
    const worst = heap[0]!;
    // Most offers lose on score alone: tested before anything is allocated for them.
    if (score < worst.score) return;
    const offered = { slot, score, date };
    if (better(offered, worst) <= 0) return;
    heap[0] = offered;
    for (let i = 0; ;) {
      const left = 2 * i + 1;
      const right = left + 1;
      let least = i;
      if (left < heap.length && better(heap[left]!, heap[least]!) < 0) least = left;
      if (right < heap.length && better(heap[right]!, heap[least]!) < 0) least = right;
      if (least === i) break;
      [heap[least], heap[i]] = [heap[i]!, heap[least]!];
      i = least;
    }
  }

  /** Best first. */
  sorted(): Ranked[] {
    return [...this.heap].sort((a, b) => better(b, a));
  }
}

/**
 * The embedded engine: an index in the API's memory (compact-index.ts), built from
 * MariaDB at boot and updated on every write. Right for one API process; several need
 * Meilisearch.
 */
export class EmbeddedSearchEngine extends SearchEngine {
  readonly persistent = false;
  private index = new CompactIndex(searchFieldNames.length, wordsOf);
  private columns = new SlotColumns();
  /** Document id → its slot in the index, and slot → document. */
  private readonly slots = new Map<string, number>();
  private documents: Array<SearchDocument | undefined> = [];

  start(): Promise<void> {
    return Promise.resolve();
  }

  replaceAll(documents: SearchDocument[]): Promise<void> {
    this.index = new CompactIndex(searchFieldNames.length, wordsOf);
    this.columns = new SlotColumns();
    this.slots.clear();
    this.documents = [];
    for (const document of documents) this.add(document);
    return Promise.resolve();
  }

  upsert(documents: SearchDocument[]): Promise<void> {
    for (const document of documents) {
      this.discard(document.id);
      this.add(document);
    }
    this.index.compactIfWorthIt((slot) => this.documents[slot] !== undefined);
    return Promise.resolve();
  }

  remove(ids: string[]): Promise<void> {
    for (const id of ids) this.discard(id);
    this.index.compactIfWorthIt((slot) => this.documents[slot] !== undefined);
    return Promise.resolve();
  }

  count(): Promise<number> {
    return Promise.resolve(this.slots.size);
  }

  search(query: EngineQuery): Promise<EngineResult> {
    const groups = this.groupsOf(query.q, query.match);
    const facets = query.match === 'all' ? this.columns.facets() : null;
    const best = new BestOf(query.offset + query.limit);
    const accepted = this.columns.filter(query.filters);
    let total = 0;
    this.index.search(
      groups,
      query.match === 'all',
      boosts,
      (slot) => this.documents[slot] !== undefined && accepted(slot),
      (slot, score) => {
        total += 1;
        facets?.add(slot);
        best.offer(slot, score, this.columns.dateOf(slot));
      },
    );
    return Promise.resolve({
      hits: best
        .sorted()
        .slice(query.offset)
        .map(({ slot, score }) => this.hitOf(slot, score, groups)),
      total,
      facets: facets?.result() ?? { type: {}, status: {}, topics: {} },
    });
  }

  /** Each word of the query, or one of its synonyms, as the index's own words. */
  private groupsOf(q: string, match: EngineQuery['match']): TermGroup[] {
    const words = wordsOf(q);
    return [...new Set(words)].map((word) => {
      const asWritten = match === 'any' && stopWords.has(word);
      return [
        {
          derived: this.index.derive(word, {
            prefix: !asWritten && prefixAllowed(word, word === words.at(-1)),
            typos: asWritten ? 0 : typoAllowance(word),
          }),
        },
        // A synonym is a word the desk chose: it matches as written, not with typos, and
        // weighs less than the word itself, so the word's own matches come first.
        ...(searchSynonyms[word] ?? []).map((synonym) => ({
          derived: this.index.derive(synonym, { prefix: false, typos: 0 }),
          standsFor: word,
        })),
      ];
    });
  }

  private add(document: SearchDocument): void {
    const slot = this.index.add(fieldsOf(document));
    this.columns.set(slot, document);
    this.documents[slot] = document;
    this.slots.set(document.id, slot);
  }

  private discard(id: string): void {
    const slot = this.slots.get(id);
    if (slot === undefined) return;
    this.index.remove(slot, fieldsOf(this.documents[slot]!));
    this.documents[slot] = undefined;
    this.slots.delete(id);
  }

  /** A hit with the words of the document that matched, per field, for highlighting. */
  private hitOf(slot: number, score: number, groups: TermGroup[]): EngineHit {
    const matchedTerms: EngineHit['matchedTerms'] = {};
    for (const { derived } of groups.flat()) {
      for (const { term } of derived) {
        searchFieldNames.forEach((field: SearchField, index) => {
          if (!this.index.has(term, index, slot)) return;
          const terms = (matchedTerms[field] ??= []);
          if (!terms.includes(term)) terms.push(term);
        });
      }
    }
    return { document: this.documents[slot]!, score, matchedTerms };
  }
}
