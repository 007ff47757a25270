import { type SearchDocument } from '../search-document';
import { type EngineFilters, type EngineResult } from '../search-engine';
import { withRoom } from './typed-arrays';

/**
 * What the filters and facets read of each indexed document, as numbers in typed arrays
 * by slot. A common word matches tens of thousands of documents; reading their objects
 * (scattered through the heap) cost a microsecond each, these columns a few nanoseconds.
 * Strings (kinds, statuses, topics, ratings, audiences) are numbered in one dictionary;
 * 0 stands for none.
 */
export class SlotColumns {
  private readonly codes = new Map<string, number>();
  private readonly names: string[] = [''];
  private type = new Uint16Array(1024);
  private status = new Uint16Array(1024);
  private audience = new Uint16Array(1024);
  private rating = new Uint16Array(1024);
  private date = new Float64Array(1024);
  /**
   * Every slot's topic codes, one after another: a slot's are `topicCount[slot]` codes
   * from `topicStart[slot]`. One array, not one per slot: 100 000 small typed arrays held
   * some 20 MB of their own (npm run bench). Slots are only ever appended.
   */
  private topicCodes = new Uint16Array(4096);
  private topicsUsed = 0;
  private topicStart = new Uint32Array(1024);
  private topicCount = new Uint16Array(1024);

  set(slot: number, document: SearchDocument): void {
    this.grow(slot + 1);
    this.type[slot] = this.code(document.type);
    this.status[slot] = this.code(document.status);
    this.audience[slot] = this.code(document.audience);
    this.rating[slot] = this.code(document.rating);
    this.date[slot] = document.date;
    const codes = document.topicList.map((topic) => this.code(topic));
    this.topicCodes = withRoom(this.topicCodes, this.topicsUsed + codes.length);
    this.topicCodes.set(codes, this.topicsUsed);
    this.topicStart[slot] = this.topicsUsed;
    this.topicCount[slot] = codes.length;
    this.topicsUsed += codes.length;
  }

  /** Whether the slot's topics hold `code`. */
  private hasTopic(slot: number, code: number): boolean {
    const start = this.topicStart[slot]!;
    const end = start + this.topicCount[slot]!;
    for (let i = start; i < end; i += 1) if (this.topicCodes[i] === code) return true;
    return false;
  }

  dateOf(slot: number): number {
    return this.date[slot]!;
  }

  /** A test of a slot against the filters, with their strings looked up once. */
  filter(filters: EngineFilters): (slot: number) => boolean {
    // A value never indexed matches nothing: -1 is no code.
    const known = (value: string) => this.codes.get(value) ?? -1;
    const types = filters.types ? new Set(filters.types.map(known)) : null;
    const status = filters.status ? known(filters.status) : 0;
    const topic = filters.topic ? known(filters.topic) : 0;
    const rating = filters.rating ? known(filters.rating) : 0;
    const audience = filters.audience ? known(filters.audience) : 0;
    const { from, before } = filters;
    const {
      type: kinds,
      status: statuses,
      rating: ratings,
      audience: audiences,
      date: dates,
    } = this;
    return (slot) =>
      (types === null || types.has(kinds[slot]!)) &&
      (status === 0 || statuses[slot] === status) &&
      (rating === 0 || ratings[slot] === rating) &&
      (audience === 0 || audiences[slot] === audience) &&
      (from === undefined || dates[slot]! >= from) &&
      (before === undefined || dates[slot]! < before) &&
      (topic === 0 || this.hasTopic(slot, topic));
  }

  /** Counts of kinds, statuses and topics over the slots given to `add`. */
  facets(): { add: (slot: number) => void; result: () => EngineResult['facets'] } {
    const size = this.names.length;
    const [types, statuses, topics] = [0, 0, 0].map(() => new Int32Array(size)) as [
      Int32Array,
      Int32Array,
      Int32Array,
    ];
    const named = (counts: Int32Array) => {
      const record: Record<string, number> = {};
      counts.forEach((count, code) => {
        if (count > 0 && code > 0) record[this.names[code]!] = count;
      });
      return record;
    };
    return {
      add: (slot) => {
        types[this.type[slot]!]! += 1;
        statuses[this.status[slot]!]! += 1;
        const start = this.topicStart[slot]!;
        const end = start + this.topicCount[slot]!;
        for (let i = start; i < end; i += 1) topics[this.topicCodes[i]!]! += 1;
      },
      result: () => ({ type: named(types), status: named(statuses), topics: named(topics) }),
    };
  }

  private code(value: string | null): number {
    if (value === null) return 0;
    let code = this.codes.get(value);
    if (code === undefined) {
      code = this.names.length;
      this.codes.set(value, code);
      this.names.push(value);
    }
    return code;
  }

  /** Makes the columns hold `slots` slots. */
  private grow(slots: number): void {
    this.type = withRoom(this.type, slots);
    this.status = withRoom(this.status, slots);
    this.audience = withRoom(this.audience, slots);
    this.rating = withRoom(this.rating, slots);
    this.date = withRoom(this.date, slots);
    this.topicStart = withRoom(this.topicStart, slots);
    this.topicCount = withRoom(this.topicCount, slots);
  }
}
