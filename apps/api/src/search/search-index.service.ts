import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { SearchDocumentsReader } from './search-documents.reader';
import { documentId, type SearchDocument } from './search-document';
import { SearchEngine } from './search-engine';

/**
 * Keeps the search engine in step with MariaDB. Services call it after their transaction
 * commits, within the same request, so a write is searchable as soon as it is answered.
 * A failure to index is logged, not thrown: the write stands, and a rebuild mends it.
 */
@Injectable()
export class SearchIndexService implements OnApplicationBootstrap {
  private readonly logger = new Logger(SearchIndexService.name);
  /** Per rebuild under way, the updates made while it reads: done again once it is in. */
  private readonly rebuilds = new Set<Array<() => Promise<void>>>();

  constructor(
    private readonly engine: SearchEngine,
    private readonly documents: SearchDocumentsReader,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.engine.start();
    // A shared engine keeps its index between boots; several API instances must not all
    // rebuild it. It is built when empty, and by `npm run search:reindex` otherwise.
    if (this.engine.persistent && (await this.engine.count()) > 0) return;
    const started = Date.now();
    const count = await this.rebuild();
    this.logger.log(`Search index built: ${count} documents in ${Date.now() - started} ms`);
  }

  /**
   * Reads every document from MariaDB and replaces the index with them. A write answered
   * while the documents are read may be missing from them, or read before it: its update
   * is made again once the new index is in, from what MariaDB holds then.
   */
  async rebuild(): Promise<number> {
    const updatedMeanwhile: Array<() => Promise<void>> = [];
    this.rebuilds.add(updatedMeanwhile);
    const all: SearchDocument[] = [];
    try {
      for await (const batch of this.documents.all()) all.push(...batch);
      await this.engine.replaceAll(all);
    } finally {
      this.rebuilds.delete(updatedMeanwhile);
    }
    for (const update of updatedMeanwhile) await this.safely(update);
    return all.length;
  }

  claimsChanged(ids: string[]): Promise<void> {
    return this.refresh('claim', ids, () => this.documents.claims(ids));
  }

  claimantChanged(claimantId: string): Promise<void> {
    return this.safely(async () =>
      this.engine.upsert(await this.documents.claimsOfClaimant(claimantId)),
    );
  }

  /** A claim's explainer was published or updated. */
  explainersChanged(claimIds: string[]): Promise<void> {
    return this.refresh('explainer', claimIds, () => this.documents.explainers(claimIds));
  }

  sourcesChanged(ids: string[]): Promise<void> {
    return this.refresh('source', ids, () => this.documents.sources(ids));
  }

  /** Upserts what still exists and removes what is gone. */
  private refresh(
    type: SearchDocument['type'],
    ids: string[],
    read: () => Promise<SearchDocument[]>,
  ): Promise<void> {
    return this.safely(async () => {
      const found = await read();
      const present = new Set(found.map((document) => document.entityId));
      await this.engine.upsert(found);
      const gone = ids.filter((id) => !present.has(id)).map((id) => documentId(type, id));
      if (gone.length) await this.engine.remove(gone);
    });
  }

  private async safely(work: () => Promise<void>): Promise<void> {
    for (const updatedMeanwhile of this.rebuilds) updatedMeanwhile.push(work);
    try {
      await work();
    } catch (error) {
      this.logger.error(`Search index not updated; run a reindex: ${String(error)}`);
    }
  }
}
