import { EmbeddedSearchEngine } from './engines/embedded-engine';
import { claimDocument } from '../../test/support/search-documents';
import { type SearchDocument } from './search-document';
import { type SearchDocumentsReader } from './search-documents.reader';
import { SearchIndexService } from './search-index.service';

const claimId = '00000000-0000-4000-8000-0000000000a1';

const claim = (title: string) =>
  claimDocument(claimId, {
    title,
    text: title,
    claimant: 'Wenlow Energy Forum',
    date: Date.parse('2026-11-27T10:00:00Z'),
  });

/**
 * MariaDB's side, held in memory: what `all()` reads is the claim as it was when the
 * rebuild began, and the rebuild waits at `paused` until the test lets it go on.
 */
class ReaderDuringAWrite {
  stored = claim('Volcanoes emit more carbon dioxide than people');
  private release!: () => void;
  private readonly gate = new Promise<void>((resolve) => (this.release = resolve));
  readonly paused: Promise<void>;
  private reachedGate!: () => void;

  constructor() {
    this.paused = new Promise<void>((resolve) => (this.reachedGate = resolve));
  }

  async *all(): AsyncGenerator<SearchDocument[]> {
    const readBeforeTheWrite = [this.stored];
    this.reachedGate();
    await this.gate;
    yield readBeforeTheWrite;
  }

  claims(ids: string[]): Promise<SearchDocument[]> {
    return Promise.resolve(ids.includes(claimId) ? [this.stored] : []);
  }

  goOn(): void {
    this.release();
  }
}

describe('SearchIndexService', () => {
  it('keeps a write made while a rebuild reads the documents', async () => {
    const engine = new EmbeddedSearchEngine();
    const reader = new ReaderDuringAWrite();
    const index = new SearchIndexService(engine, reader as unknown as SearchDocumentsReader);
    const found = async (q: string) =>
      (await engine.search({ q, filters: {}, offset: 0, limit: 5, match: 'all' })).hits.map(
        (hit) => hit.document.title,
      );

    const rebuilt = index.rebuild();
    await reader.paused;
    // The claim is edited and its request answered while the rebuild is still reading.
    reader.stored = claim('Undersea volcanoes are warming the oceans');
    await index.claimsChanged([claimId]);
    reader.goOn();

    await expect(rebuilt).resolves.toBe(1);
    expect(await found('undersea')).toEqual(['Undersea volcanoes are warming the oceans']);
    expect(await found('people')).toEqual([]);
  });
});
