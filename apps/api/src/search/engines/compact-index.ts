import { withRoom } from './typed-arrays';

/**
 * An inverted index in typed arrays, for the embedded engine. Documents live in numbered
 * slots; each word has, per field, the slots it occurs in (ascending) and how often.
 * Scoring is BM25 with MiniSearch's defaults (k 1.2, b 0.7, d 0.5), and prefix and typo
 * matches are weighted as MiniSearch weights them, so results rank as they did with it.
 *
 * Why not MiniSearch itself: it builds an object per matching document and sorts them
 * all, about 3 µs a match, so a word found in half of 100 000 claims took 200 ms; and its
 * maps of maps held some 300 MB. Here a search touches numbers only, and the page is
 * picked from the matches without sorting them (npm run bench).
 */

const BM25 = { k: 1.2, b: 0.7, d: 0.5 };
const PREFIX_WEIGHT = 0.375;
const FUZZY_WEIGHT = 0.45;
/**
 * What a synonym weighs beside the word it stands for: half, between a typo's and the
 * word's own. Our choice, with no published source: the word's own matches come first in
 * the same field.
 */
const SYNONYM_WEIGHT = 0.5;
/**
 * Query words whose derived words are kept at most (`derive`), and the longest word kept:
 * no word of a language is longer, and a typed claim may hold a 4 000-letter one.
 */
const DERIVED_KEPT = { words: 10_000, letters: 40 } as const;
/** The mark of a slot the filters left out, so it is not asked again in the same search. */
const REJECTED = -1;

class Posting {
  slots = new Int32Array(4);
  counts = new Uint16Array(4);
  size = 0;
  /** Slots still holding a document: the posting's share of the documents, for BM25. */
  live = 0;

  push(slot: number, count: number): void {
    this.slots = withRoom(this.slots, this.size + 1);
    this.counts = withRoom(this.counts, this.size + 1);
    this.slots[this.size] = slot;
    this.counts[this.size] = Math.min(count, 65_535);
    this.size += 1;
    this.live += 1;
  }

  /** Whether `slot` is listed (binary search: slots are ascending). */
  has(slot: number): boolean {
    let low = 0;
    let high = this.size - 1;
    while (low <= high) {
      const middle = (low + high) >> 1;
      const value = this.slots[middle]!;
      if (value === slot) return true;
      if (value < slot) low = middle + 1;
      else high = middle - 1;
    }
    return false;
  }
}

/** Two rows of the distance table, reused: fuzzy matching compares thousands of words. */
let rows = [new Int32Array(64), new Int32Array(64)] as const;

/** Levenshtein distance, or `max + 1` as soon as it must exceed `max`. */
export function boundedDistance(a: string, b: string, max: number): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  if (rows[0].length <= b.length)
    rows = [new Int32Array(b.length + 1), new Int32Array(b.length + 1)];
  let [previous, current] = rows;
  for (let j = 0; j <= b.length; j += 1) previous[j] = j;
  for (let i = 1; i <= a.length; i += 1) {
    current[0] = i;
    let rowMin = i;
    for (let j = 1; j <= b.length; j += 1) {
      const cost = a.charCodeAt(i - 1) === b.charCodeAt(j - 1) ? 0 : 1;
      const value = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost);
      current[j] = value;
      if (value < rowMin) rowMin = value;
    }
    if (rowMin > max) return max + 1;
    [previous, current] = [current, previous];
  }
  return previous[b.length]!;
}

/** A word of the index a query word stands for, with its weight (1 when exact). */
export interface DerivedTerm {
  term: string;
  weight: number;
}

/** One query word (or synonym): what it matched becomes the document's `matchedTerms`. */
export interface SourceTerm {
  derived: readonly DerivedTerm[];
  /**
   * For a synonym, the query word it stands in for: it weighs `SYNONYM_WEIGHT` of the word,
   * and in each field counts as being in as many documents as the commoner of the two, so
   * a synonym rarer than the word is not weighed above it (as Lucene's SynonymQuery takes
   * the largest document count).
   */
  standsFor?: string;
}

/** Words of which a document must match at least one (all groups, for `all` queries). */
export type TermGroup = SourceTerm[];

export interface Scored {
  slot: number;
  score: number;
}

/**
 * Which words of an `any` search are common: those in more than `share` of the documents
 * and in more than `rarest` times as many as the query's rarest word; never those in
 * `floor` documents or fewer, so a small index is searched in full. Our choice, measured
 * with npm run bench.
 */
const commonWords = { share: 0.05, rarest: 1.25, floor: 1_000 } as const;

/** The per-slot arrays a search fills. */
interface Scratch {
  /**
   * The slots a search has touched, in the order found: the first `touchedCount`. Growing
   * a plain array to tens of thousands of slots took a third of a similar-claims search.
   */
  touched: Int32Array;
  touchedCount: number;
  scores: Float64Array;
  /** Per slot: the last query word and group counted (packed), or `REJECTED`. */
  marks: Int32Array;
  /** Per slot: how many query words matched. */
  quality: Uint16Array;
  groupsMet: Uint16Array;
}

/** A query word in the order of the search; a common one only adds to documents found. */
interface SearchOrder {
  groupIndex: number;
  source: SourceTerm;
  common: boolean;
}

interface ScoreParts {
  boost: number;
  perWord: number;
  sourceIndex: number;
  groupMark: number;
  earlierGroups: number;
}

/** Adds one posting's share (one word, one field) to the scores of the slots it lists. */
class PostingScorer {
  private readonly scores: Float64Array;
  private readonly marks: Int32Array;
  private readonly quality: Uint16Array;
  private readonly groupsMet: Uint16Array;

  constructor(
    private readonly scratch: Scratch,
    private readonly posting: Posting,
    private readonly lengths: Uint16Array,
    private readonly parts: ScoreParts,
  ) {
    ({
      scores: this.scores,
      marks: this.marks,
      quality: this.quality,
      groupsMet: this.groupsMet,
    } = scratch);
  }

  /** Every slot listed, adding the new ones to the touched (each asked of `accept` once). */
  walk(accept: (slot: number) => boolean): void {
    const { marks, groupsMet } = this;
    const { slots, counts, size } = this.posting;
    const { earlierGroups } = this.parts;
    for (let i = 0; i < size; i += 1) {
      const slot = slots[i]!;
      // A slot that missed an earlier group of an `all` query cannot match them all.
      if (groupsMet[slot]! < earlierGroups) continue;
      const mark = marks[slot]!;
      if (mark === REJECTED) continue;
      if (mark === 0) {
        this.scratch.touched[this.scratch.touchedCount] = slot;
        this.scratch.touchedCount += 1;
        if (!accept(slot)) {
          marks[slot] = REJECTED;
          continue;
        }
      }
      this.credit(slot, counts[i]!, mark);
    }
  }

  /**
   * Only the slots already found (`found`, ascending): by galloping through the posting
   * when they are few beside it, else by walking it and passing over the others.
   */
  probe(found: Int32Array): void {
    const { marks } = this;
    const { slots, counts, size } = this.posting;
    if (found.length * 4 > size) {
      for (let i = 0; i < size; i += 1) {
        const slot = slots[i]!;
        const mark = marks[slot]!;
        if (mark !== 0 && mark !== REJECTED) this.credit(slot, counts[i]!, mark);
      }
      return;
    }
    let i = 0;
    for (const slot of found) {
      if (i >= size) return;
      if (slots[i]! < slot) {
        let low = i;
        let step = 1;
        while (low + step < size && slots[low + step]! < slot) {
          low += step;
          step *= 2;
        }
        let high = Math.min(low + step, size);
        while (low + 1 < high) {
          const middle = (low + high) >> 1;
          if (slots[middle]! < slot) low = middle;
          else high = middle;
        }
        i = high;
      }
      if (i < size && slots[i] === slot) this.credit(slot, counts[i]!, marks[slot]!);
    }
  }

  private credit(slot: number, frequency: number, mark: number): void {
    const { boost, perWord, sourceIndex, groupMark } = this.parts;
    // BM25: tf (k + 1) / (tf + k (1 − b + b · length / average length)).
    this.scores[slot]! +=
      boost *
      (BM25.d +
        (frequency * (BM25.k + 1)) /
          (frequency + BM25.k * (1 - BM25.b) + perWord * this.lengths[slot]!));
    // The mark packs the last query word and the last group counted for the slot.
    if (mark >> 16 !== sourceIndex) {
      this.quality[slot]! += 1;
      if ((mark & 0xffff) !== groupMark) this.groupsMet[slot]! += 1;
      this.marks[slot] = (sourceIndex << 16) | groupMark;
    }
  }
}

export class CompactIndex {
  private readonly termIds = new Map<string, number>();
  private readonly terms: string[] = [];
  /** termId → field → posting. */
  private readonly postings: Array<Array<Posting | undefined>> = [];
  private readonly termsByLength = new Map<number, number[]>();
  private sortedTerms: string[] = [];
  private sortedDirty = false;
  private readonly derivedKept = new Map<string, readonly DerivedTerm[]>();
  private readonly lengths: Uint16Array[];
  private readonly lengthSums: number[];
  private liveCount = 0;
  private slotCount = 0;
  private deadPostings = 0;
  private totalPostings = 0;
  /** Per-search scratch, reused: only the slots a search touches are cleared after it. */
  private scratch: Scratch = {
    touched: new Int32Array(0),
    touchedCount: 0,
    scores: new Float64Array(0),
    marks: new Int32Array(0),
    quality: new Uint16Array(0),
    groupsMet: new Uint16Array(0),
  };

  constructor(
    private readonly fieldCount: number,
    private readonly tokenize: (text: string) => string[],
  ) {
    this.lengths = Array.from({ length: fieldCount }, () => new Uint16Array(1024));
    this.lengthSums = Array.from({ length: fieldCount }, () => 0);
  }

  get size(): number {
    return this.liveCount;
  }

  /** Indexes a document's field texts in a new slot, which it returns. */
  add(fields: readonly string[]): number {
    const slot = this.slotCount;
    this.slotCount += 1;
    this.grow(slot + 1);
    fields.forEach((text, field) => {
      const counts = new Map<string, number>();
      for (const word of this.tokenize(text)) counts.set(word, (counts.get(word) ?? 0) + 1);
      // A field's length is its number of distinct words, as MiniSearch 7 counts it.
      this.lengths[field]![slot] = Math.min(counts.size, 65_535);
      this.lengthSums[field]! += this.lengths[field]![slot]!;
      for (const [word, count] of counts) {
        const postings = this.postings[this.termId(word)]!;
        (postings[field] ??= new Posting()).push(slot, count);
        this.totalPostings += 1;
      }
    });
    this.liveCount += 1;
    return slot;
  }

  /** Forgets the document in `slot`, given its field texts; compacts when much is dead. */
  remove(slot: number, fields: readonly string[]): void {
    fields.forEach((text, field) => {
      const words = new Set(this.tokenize(text));
      this.lengthSums[field]! -= this.lengths[field]![slot]!;
      for (const word of words) {
        const posting = this.postings[this.termIds.get(word)!]?.[field];
        if (posting) posting.live -= 1;
        this.deadPostings += 1;
      }
    });
    this.liveCount -= 1;
  }

  /**
   * Drops dead slots from the postings once they are a quarter of them. `isLive` says
   * which slots still hold a document.
   */
  compactIfWorthIt(isLive: (slot: number) => boolean): void {
    if (this.deadPostings < 10_000 || this.deadPostings * 4 < this.totalPostings) return;
    for (const fields of this.postings) {
      for (const posting of fields) {
        if (!posting) continue;
        let kept = 0;
        for (let i = 0; i < posting.size; i += 1) {
          const slot = posting.slots[i]!;
          if (!isLive(slot)) continue;
          posting.slots[kept] = slot;
          posting.counts[kept] = posting.counts[i]!;
          kept += 1;
        }
        posting.size = kept;
        posting.live = kept;
      }
    }
    this.totalPostings -= this.deadPostings;
    this.deadPostings = 0;
  }

  /**
   * The index's own words that `word` stands for: itself, words it begins, near
   * misspellings. Kept until the index learns a new word: finding the misspellings compares
   * the word with thousands, and a claim being typed asks again for every word at each
   * pause.
   */
  derive(word: string, options: { prefix: boolean; typos: number }): readonly DerivedTerm[] {
    if (word.length > DERIVED_KEPT.letters) return this.deriveAfresh(word, options);
    const key = `${options.prefix ? '+' : '='}${options.typos}${word}`;
    let derived = this.derivedKept.get(key);
    if (!derived) {
      if (this.derivedKept.size >= DERIVED_KEPT.words) this.derivedKept.clear();
      derived = this.deriveAfresh(word, options);
      this.derivedKept.set(key, derived);
    }
    return derived;
  }

  private deriveAfresh(word: string, options: { prefix: boolean; typos: number }): DerivedTerm[] {
    const derived: DerivedTerm[] = [];
    if (this.termIds.has(word)) derived.push({ term: word, weight: 1 });
    const seen = new Set([word]);
    if (options.prefix) {
      for (const term of this.startingWith(word)) {
        if (seen.has(term)) continue;
        seen.add(term);
        const extra = term.length - word.length;
        derived.push({ term, weight: (PREFIX_WEIGHT * term.length) / (term.length + 0.3 * extra) });
      }
    }
    // Without typos, the exact word is all the index can have of it: no words to compare.
    for (
      let length = word.length - options.typos;
      options.typos > 0 && length <= word.length + options.typos;
      length += 1
    ) {
      for (const id of this.termsByLength.get(length) ?? []) {
        const term = this.terms[id]!;
        if (seen.has(term)) continue;
        const distance = boundedDistance(word, term, options.typos);
        if (distance > options.typos) continue;
        seen.add(term);
        derived.push({ term, weight: (FUZZY_WEIGHT * term.length) / (term.length + distance) });
      }
    }
    return derived;
  }

  /**
   * Scores every slot that matches the groups (each group when `all`, any when not) and
   * `accept`s, and hands each to `visit` with its score; BM25 summed over words and fields,
   * times the number of query words matched, as MiniSearch scores.
   *
   * In an `any` search, common words only add to the scores of documents the rarer words
   * found (the idea of Lucene's CommonTermsQuery): a typed sentence's "the" or "warming"
   * alone would otherwise rank most of the index. See `commonWords` for which are common.
   */
  search(
    groups: readonly TermGroup[],
    all: boolean,
    boosts: readonly number[],
    accept: (slot: number) => boolean,
    visit: (slot: number, score: number) => void,
  ): void {
    this.grow(this.slotCount);
    const scratch = this.scratch;
    const { scores, marks, quality, groupsMet } = scratch;
    scratch.touchedCount = 0;
    let found: Int32Array | undefined;
    this.inSearchOrder(groups, all).forEach((word, index) => {
      if (!word.common) {
        this.scorers(word, index, all, boosts, (scorer) => scorer.walk(accept));
        return;
      }
      found ??= this.foundSoFar();
      this.scorers(word, index, all, boosts, (scorer) => scorer.probe(found!));
    });
    const { touched, touchedCount } = scratch;
    for (let i = 0; i < touchedCount; i += 1) {
      const slot = touched[i]!;
      if (marks[slot] !== REJECTED && (!all || groupsMet[slot] === groups.length)) {
        visit(slot, scores[slot]! * quality[slot]!);
      }
      scores[slot] = 0;
      marks[slot] = 0;
      quality[slot] = 0;
      groupsMet[slot] = 0;
    }
  }

  /** The slots touched and accepted so far, ascending. */
  private foundSoFar(): Int32Array {
    const { touched, touchedCount, marks } = this.scratch;
    const found = new Int32Array(touchedCount);
    let size = 0;
    for (let i = 0; i < touchedCount; i += 1) {
      if (marks[touched[i]!] !== REJECTED) found[size++] = touched[i]!;
    }
    // A typed array sorts numbers natively, many times faster than with a comparator.
    return found.subarray(0, size).sort();
  }

  /** Hands `use` a scorer for each posting of one query word, the `index`-th walked. */
  private scorers(
    word: SearchOrder,
    index: number,
    all: boolean,
    boosts: readonly number[],
    use: (scorer: PostingScorer) => void,
  ): void {
    const { derived, standsFor } = word.source;
    const wordFields = standsFor === undefined ? undefined : this.postingsOf(standsFor);
    const sourceWeight = standsFor === undefined ? 1 : SYNONYM_WEIGHT;
    for (const { term, weight } of derived) {
      const fields = this.postingsOf(term);
      if (!fields) continue;
      for (let field = 0; field < fields.length; field += 1) {
        const posting = fields[field];
        if (!posting || posting.live === 0) continue;
        const live = Math.max(posting.live, wordFields?.[field]?.live ?? 0);
        const idf = Math.log(1 + (this.liveCount - live + 0.5) / (live + 0.5));
        const average = this.lengthSums[field]! / Math.max(1, this.liveCount);
        use(
          new PostingScorer(this.scratch, posting, this.lengths[field]!, {
            boost: sourceWeight * weight * boosts[field]! * idf,
            perWord: (BM25.k * BM25.b) / average,
            sourceIndex: index + 1,
            groupMark: word.groupIndex + 1,
            earlierGroups: all ? word.groupIndex : 0,
          }),
        );
      }
    }
  }

  /**
   * The query words in the order they are walked, each with its group: as given; in an
   * `any` search with common words, the rarer ones first.
   */
  private inSearchOrder(groups: readonly TermGroup[], all: boolean): SearchOrder[] {
    const words = groups.flatMap((group, groupIndex) =>
      group.map((source) => ({ groupIndex, source, common: false })),
    );
    if (all) return words;
    const documents = words.map((word) => this.documentsWith(word.source));
    const { share, floor, rarest } = commonWords;
    const cutoff = Math.max(floor, share * this.liveCount);
    // A word the index lacks finds nothing: the rarest is the rarest word it has.
    const rarestCutoff = Math.max(floor, rarest * Math.min(...documents.filter((n) => n > 0)));
    words.forEach((word, i) => {
      word.common = documents[i]! > cutoff && documents[i]! > rarestCutoff;
    });
    return [...words.filter((word) => !word.common), ...words.filter((word) => word.common)];
  }

  /** About how many documents a query word finds: per word it stands for, its commonest field. */
  private documentsWith(source: SourceTerm): number {
    let documents = 0;
    for (const { term } of source.derived) {
      let most = 0;
      for (const posting of this.postings[this.termIds.get(term)!] ?? []) {
        most = Math.max(most, posting?.live ?? 0);
      }
      documents += most;
    }
    return documents;
  }

  /** Whether the document in `slot` has `term` in `field`. */
  has(term: string, field: number, slot: number): boolean {
    return this.postingsOf(term)?.[field]?.has(slot) ?? false;
  }

  /** A word's posting per field; undefined for a word the index has never seen. */
  private postingsOf(term: string): Array<Posting | undefined> | undefined {
    return this.postings[this.termIds.get(term) ?? -1];
  }

  private termId(word: string): number {
    let id = this.termIds.get(word);
    if (id === undefined) {
      id = this.terms.length;
      this.termIds.set(word, id);
      this.terms.push(word);
      this.postings.push([]);
      const sameLength = this.termsByLength.get(word.length) ?? [];
      sameLength.push(id);
      this.termsByLength.set(word.length, sameLength);
      this.sortedDirty = true;
      this.derivedKept.clear();
    }
    return id;
  }

  private *startingWith(prefix: string): Generator<string> {
    if (this.sortedDirty) {
      this.sortedTerms = [...this.terms].sort();
      this.sortedDirty = false;
    }
    let low = 0;
    let high = this.sortedTerms.length;
    while (low < high) {
      const middle = (low + high) >> 1;
      if (this.sortedTerms[middle]! < prefix) low = middle + 1;
      else high = middle;
    }
    for (
      let i = low;
      i < this.sortedTerms.length && this.sortedTerms[i]!.startsWith(prefix);
      i += 1
    ) {
      yield this.sortedTerms[i]!;
    }
  }

  /** Makes the per-slot arrays hold `slots` slots. */
  private grow(slots: number): void {
    if (this.scratch.scores.length >= slots && this.lengths[0]!.length >= slots) return;
    const size = Math.max(1024, slots * 2);
    const { touched, scores, marks, quality, groupsMet } = this.scratch;
    this.scratch = {
      touched: withRoom(touched, slots, size),
      touchedCount: 0,
      scores: withRoom(scores, slots, size),
      marks: withRoom(marks, slots, size),
      quality: withRoom(quality, slots, size),
      groupsMet: withRoom(groupsMet, slots, size),
    };
    for (let field = 0; field < this.fieldCount; field += 1) {
      this.lengths[field] = withRoom(this.lengths[field]!, slots, size);
    }
  }
}
