import MiniSearch, { type Query } from 'minisearch';
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import { type AddressInfo } from 'node:net';

/**
 * A small stand-in for a Meilisearch server: the few HTTP endpoints the official client
 * calls for Skyledger (indexes, settings, documents, tasks, stats, search, swapping two
 * indexes), on 127.0.0.1.
 * The Meilisearch server cannot be installed on this machine, so the engine's tests run
 * here; set MEILI_TEST_HOST to run the same suites against a real one.
 *
 * What it enforces as Meilisearch does: filters and facets only on filterable attributes,
 * searches only in searchable attributes (weighted by their order), synonyms, typo
 * tolerance by word length, prefix matching of the last query word, `matchingStrategy`
 * `all` (every word) or not, match positions as UTF-8 byte ranges, tasks to wait on.
 * Ranking beyond that is MiniSearch's, not Meilisearch's bucket sort.
 */

type Doc = Record<string, unknown> & { id: string };

interface Settings {
  searchableAttributes: string[];
  filterableAttributes: string[];
  sortableAttributes: string[];
  synonyms: Record<string, string[]>;
  typoTolerance: { enabled: boolean; minWordSizeForTypos: { oneTypo: number; twoTypos: number } };
}

interface FakeIndex {
  uid: string;
  primaryKey: string;
  settings: Settings;
  documents: Map<string, Doc>;
}

interface Task {
  taskUid: number;
  indexUid: string | null;
  status: 'succeeded' | 'failed';
  type: string;
  error: { message: string; code: string; type: string; link: string } | null;
}

class MeiliError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly code: string,
  ) {
    super(message);
  }
}

const defaultSettings = (): Settings => ({
  searchableAttributes: ['*'],
  filterableAttributes: [],
  sortableAttributes: [],
  synonyms: {},
  typoTolerance: { enabled: true, minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 } },
});

const normalise = (word: string) =>
  word
    .normalize('NFD')
    .replace(/\p{M}+/gu, '')
    .toLowerCase();
const wordsOf = (text: string) => (text.match(/[\p{L}\p{N}]+/gu) ?? []).map(normalise);

/** Parses the filter grammar the engine writes: `a = "x"`, `a IN ["x"]`, `a >= 1`, `a < 2`, joined by AND. */
function parseFilter(filter: string, filterable: string[]): Array<(doc: Doc) => boolean> {
  if (!filter.trim()) return [];
  return filter.split(/\s+AND\s+/).map((clause) => {
    const found = /^(\w+)\s*(=|IN|>=|<)\s*(.+)$/.exec(clause.trim());
    if (!found) throw new MeiliError(400, `Invalid filter: ${clause}`, 'invalid_search_filter');
    const [, attribute, operator, raw] = found as unknown as [string, string, string, string];
    if (!filterable.includes(attribute)) {
      throw new MeiliError(
        400,
        `Attribute \`${attribute}\` is not filterable. Available filterable attributes are: ${filterable.join(', ')}.`,
        'invalid_search_filter',
      );
    }
    const value = JSON.parse(raw) as unknown;
    const has = (doc: Doc, wanted: unknown) => {
      const actual = doc[attribute];
      return Array.isArray(actual) ? actual.includes(wanted) : actual === wanted;
    };
    if (operator === '=') return (doc) => has(doc, value);
    if (operator === 'IN') return (doc) => (value as unknown[]).some((item) => has(doc, item));
    if (operator === '>=') return (doc) => (doc[attribute] as number) >= (value as number);
    return (doc) => (doc[attribute] as number) < (value as number);
  });
}

function byteRanges(text: string, terms: Set<string>): Array<{ start: number; length: number }> {
  const ranges: Array<{ start: number; length: number }> = [];
  for (const found of text.matchAll(/[\p{L}\p{N}]+/gu)) {
    if (!terms.has(normalise(found[0]))) continue;
    ranges.push({
      start: Buffer.byteLength(text.slice(0, found.index)),
      length: Buffer.byteLength(found[0]),
    });
  }
  return ranges;
}

export class FakeMeilisearch {
  private readonly indexes = new Map<string, FakeIndex>();
  private readonly tasks = new Map<number, Task>();
  private nextTask = 0;
  private readonly server = createServer((request, response) => {
    void this.handle(request, response);
  });
  /** Every request as `METHOD /path`, for tests that check what the client sent. */
  readonly requests: string[] = [];
  host = '';

  async start(): Promise<this> {
    await new Promise<void>((resolve) => this.server.listen(0, '127.0.0.1', resolve));
    this.host = `http://127.0.0.1:${(this.server.address() as AddressInfo).port}`;
    return this;
  }

  stop(): Promise<void> {
    return new Promise((resolve, reject) =>
      this.server.close((error) => (error ? reject(error) : resolve())),
    );
  }

  settingsOf(uid: string): Settings | undefined {
    return this.indexes.get(uid)?.settings;
  }

  private async handle(request: IncomingMessage, response: ServerResponse): Promise<void> {
    const url = new URL(request.url ?? '/', 'http://fake');
    const method = request.method ?? 'GET';
    this.requests.push(`${method} ${url.pathname}`);
    const chunks: Buffer[] = [];
    for await (const chunk of request) chunks.push(chunk as Buffer);
    const body = chunks.length ? (JSON.parse(Buffer.concat(chunks).toString()) as unknown) : null;
    try {
      const [status, payload] = this.route(method, url.pathname.split('/').filter(Boolean), body);
      response.writeHead(status, { 'Content-Type': 'application/json' });
      response.end(JSON.stringify(payload));
    } catch (error) {
      const failure =
        error instanceof MeiliError ? error : new MeiliError(500, String(error), 'internal');
      response.writeHead(failure.status, { 'Content-Type': 'application/json' });
      response.end(
        JSON.stringify({
          message: failure.message,
          code: failure.code,
          type: 'invalid_request',
          link: 'https://docs.meilisearch.com/errors',
        }),
      );
    }
  }

  private route(method: string, parts: string[], body: unknown): [number, unknown] {
    const [root, uid, sub, action] = parts;
    if (root === 'tasks' && uid && method === 'GET') {
      const task = this.tasks.get(Number(uid));
      if (!task) throw new MeiliError(404, `Task \`${uid}\` not found.`, 'task_not_found');
      return [200, { uid: task.taskUid, ...task }];
    }
    if (root === 'swap-indexes' && method === 'POST') {
      return this.task('', 'indexSwap', () => {
        for (const { indexes } of body as Array<{ indexes: [string, string] }>) {
          const [first, second] = indexes.map((id) => {
            const found = this.indexes.get(id);
            if (!found) throw new MeiliError(404, `Index \`${id}\` not found.`, 'index_not_found');
            return found;
          });
          this.indexes.set(first!.uid, { ...second!, uid: first!.uid });
          this.indexes.set(second!.uid, { ...first!, uid: second!.uid });
        }
      });
    }
    if (root !== 'indexes') throw new MeiliError(404, 'Not found', 'not_found');
    if (!uid && method === 'GET') {
      const results = [...this.indexes.values()].map(({ uid: id, primaryKey }) => ({
        uid: id,
        primaryKey,
      }));
      return [200, { results, offset: 0, limit: 1000, total: results.length }];
    }
    if (!uid && method === 'POST') {
      const { uid: id, primaryKey } = body as { uid: string; primaryKey?: string };
      return this.task(id, 'indexCreation', () => {
        if (this.indexes.has(id)) {
          throw new MeiliError(409, `Index \`${id}\` already exists.`, 'index_already_exists');
        }
        this.indexes.set(id, {
          uid: id,
          primaryKey: primaryKey ?? 'id',
          settings: defaultSettings(),
          documents: new Map(),
        });
      });
    }
    const index = this.indexes.get(uid!);
    const need = () => {
      if (!index) throw new MeiliError(404, `Index \`${uid}\` not found.`, 'index_not_found');
      return index;
    };
    if (!sub && method === 'DELETE') {
      return this.task(uid!, 'indexDeletion', () => {
        need();
        this.indexes.delete(uid!);
      });
    }
    if (sub === 'settings' && method === 'PATCH') {
      return this.task(uid!, 'settingsUpdate', () => {
        const target = need();
        target.settings = { ...target.settings, ...(body as Partial<Settings>) };
      });
    }
    if (sub === 'documents' && !action && method === 'POST') {
      return this.task(uid!, 'documentAdditionOrUpdate', () => {
        const target = need();
        for (const doc of body as Doc[]) target.documents.set(String(doc[target.primaryKey]), doc);
      });
    }
    if (sub === 'documents' && !action && method === 'DELETE') {
      return this.task(uid!, 'documentDeletion', () => need().documents.clear());
    }
    if (sub === 'documents' && action === 'delete-batch' && method === 'POST') {
      return this.task(uid!, 'documentDeletion', () => {
        for (const id of body as string[]) need().documents.delete(String(id));
      });
    }
    if (sub === 'stats' && method === 'GET') {
      return [200, { numberOfDocuments: need().documents.size, isIndexing: false }];
    }
    if (sub === 'search' && method === 'POST') return [200, this.search(need(), body as never)];
    throw new MeiliError(404, `No route ${method} /${parts.join('/')}`, 'not_found');
  }

  /** Writes happen at once; the task that reports them is already finished when read. */
  private task(indexUid: string, type: string, work: () => void): [number, unknown] {
    const taskUid = this.nextTask++;
    let error: Task['error'] = null;
    try {
      work();
    } catch (failure) {
      const meili = failure as MeiliError;
      error = { message: meili.message, code: meili.code, type: 'invalid_request', link: '' };
    }
    this.tasks.set(taskUid, {
      taskUid,
      indexUid,
      status: error ? 'failed' : 'succeeded',
      type,
      error,
    });
    return [202, { taskUid, indexUid, status: 'enqueued', type, enqueuedAt: new Date() }];
  }

  private search(
    index: FakeIndex,
    request: {
      q?: string;
      filter?: string;
      facets?: string[];
      offset?: number;
      limit?: number;
      matchingStrategy?: 'all' | 'last' | 'frequency';
    },
  ) {
    const { settings } = index;
    const filters = parseFilter(request.filter ?? '', settings.filterableAttributes);
    for (const facet of request.facets ?? []) {
      if (!settings.filterableAttributes.includes(facet)) {
        throw new MeiliError(400, `Facet \`${facet}\` is not filterable.`, 'invalid_search_facets');
      }
    }
    const candidates = [...index.documents.values()].filter((doc) =>
      filters.every((keep) => keep(doc)),
    );
    const fields =
      settings.searchableAttributes[0] === '*'
        ? Object.keys(candidates[0] ?? {}).filter((key) => typeof candidates[0]?.[key] === 'string')
        : settings.searchableAttributes;
    const mini = new MiniSearch<Doc>({
      fields,
      processTerm: (term) => normalise(term),
      extractField: (doc, field) => (typeof doc[field] === 'string' ? (doc[field] as string) : ''),
    });
    mini.addAll(candidates);

    const words = [...new Set(wordsOf(request.q ?? ''))];
    const { oneTypo, twoTypos } = settings.typoTolerance.minWordSizeForTypos;
    const typos = (term: string) =>
      !settings.typoTolerance.enabled
        ? 0
        : term.length >= twoTypos
          ? 2
          : term.length >= oneTypo
            ? 1
            : 0;
    const query: Query = {
      combineWith: request.matchingStrategy === 'all' ? 'AND' : 'OR',
      queries: words.map((word, position) => ({
        combineWith: 'OR',
        queries: [
          // Meilisearch matches the last word of the query as a prefix.
          { queries: [word], fuzzy: typos(word), prefix: position === words.length - 1 },
          ...(settings.synonyms[word] ?? []).map((synonym) => ({
            queries: [synonym],
            fuzzy: 0,
            prefix: false,
          })),
        ],
      })),
    };
    const boost = Object.fromEntries(fields.map((field, rank) => [field, fields.length - rank]));
    const results = words.length ? mini.search(query, { boost }) : [];
    const best = results[0]?.score ?? 1;

    const facetDistribution: Record<string, Record<string, number>> = {};
    for (const facet of request.facets ?? []) {
      const counts: Record<string, number> = {};
      for (const result of results) {
        const value = index.documents.get(String(result.id))?.[facet];
        for (const item of Array.isArray(value) ? value : [value]) {
          if (item !== null && item !== undefined)
            counts[String(item)] = (counts[String(item)] ?? 0) + 1;
        }
      }
      facetDistribution[facet] = counts;
    }
    const offset = request.offset ?? 0;
    const hits = results.slice(offset, offset + (request.limit ?? 20)).map((result) => {
      const doc = index.documents.get(String(result.id))!;
      const terms = new Set(Object.keys(result.match));
      const matchesPosition = Object.fromEntries(
        fields
          .filter((field) => typeof doc[field] === 'string')
          .map((field) => [field, byteRanges(doc[field] as string, terms)])
          .filter(([, ranges]) => (ranges as unknown[]).length > 0),
      );
      return { ...doc, _matchesPosition: matchesPosition, _rankingScore: result.score / best };
    });
    return {
      hits,
      query: request.q ?? '',
      offset,
      limit: request.limit ?? 20,
      estimatedTotalHits: results.length,
      facetDistribution,
      processingTimeMs: 0,
    };
  }
}
