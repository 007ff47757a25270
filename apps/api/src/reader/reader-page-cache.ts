import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { EntityChanges } from '../database/entity-changes';
import { Publication } from '../publishing/entities/publication.entity';

/** How long a rendered page is kept at most: what edits that are not publications take to show. */
const KEEP_MS = 60_000;
/** How long the time of the latest publication is trusted before it is read again. */
const LATEST_MS = 1_000;
/** Rendered pages kept at most, in characters of HTML (the oldest go first). */
const MAX_SIZE = 16 * 1024 * 1024;

/**
 * Rendered reader pages, so the same page is not read from MariaDB and rendered again for
 * every reader: rendering an explainer took ten times as long as sending the same bytes
 * from a file, and the index and the feed thirty (npm run bench).
 *
 * A page is kept with the time of the latest publication when it was rendered, and is
 * not served once a later one exists: an update note shows at once on this instance, and
 * within a second on the others (that time is read at most once a second). Edits shown on
 * a page that are not publications (a source's title, a claimant's name) show within a
 * minute.
 */
@Injectable()
export class ReaderPageCache {
  private readonly publications: EntityChanges<Publication>;
  private latest: { at: number; until: number; generation: number } | null = null;
  private size = 0;
  private readonly pages = new Map<string, { html: string; latest: number; until: number }>();

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {
    this.publications = new EntityChanges(dataSource, Publication);
  }

  /** The page kept under `key`, or `render`'s, kept when it is a page (not null). */
  async page(key: string, render: () => Promise<string | null>): Promise<string | null> {
    const generation = this.publications.generation;
    const latest = await this.latestPublication(generation);
    const kept = this.pages.get(key);
    if (kept && kept.latest === latest && kept.until > Date.now()) return kept.html;
    const html = await render();
    if (html !== null && this.publications.generation === generation) this.keep(key, html, latest);
    return html;
  }

  /** When the latest publication was published (epoch ms), read at most once a second. */
  private async latestPublication(generation: number): Promise<number> {
    const known = this.latest;
    if (known && known.generation === generation && known.until > Date.now()) return known.at;
    const [row] = await this.dataSource.query<Array<{ latest: Date | null }>>(
      "SELECT MAX(published_at) AS latest FROM publications WHERE state = 'published'",
    );
    const at = row?.latest ? new Date(row.latest).getTime() : 0;
    this.latest = { at, until: Date.now() + LATEST_MS, generation };
    return at;
  }

  private keep(key: string, html: string, latest: number): void {
    const before = this.pages.get(key);
    if (before) this.size -= before.html.length;
    this.pages.delete(key);
    this.pages.set(key, { html, latest, until: Date.now() + KEEP_MS });
    this.size += html.length;
    for (const [oldest, page] of this.pages) {
      if (this.size <= MAX_SIZE) break;
      this.pages.delete(oldest);
      this.size -= page.html.length;
    }
  }
}
