import { Inject, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  reliabilityGradeLabels,
  sourceKindLabels,
  updateNoteKindLabels,
  type ReaderAppearance,
  type ReaderCorrection,
  type ReaderExplainer,
  type ReaderExplainerSummary,
  type ReaderRating,
  type ReaderSite,
  type ReaderSource,
  type ReaderUpdateNote,
} from '@skyledger/contracts';
import { citedSourceIds, embeddedWorkingIds } from '@skyledger/explainer';
import { DataSource, In, LessThanOrEqual } from 'typeorm';
import { Appearance } from '../appearances/entities/appearance.entity';
import { Attachment } from '../attachments/entities/attachment.entity';
import { claimantForReaders } from '../claimants/claimant-view';
import { Claim } from '../claims/entities/claim.entity';
import { appConfig, type AppConfig } from '../config/configuration';
import { Dataset } from '../datasets/entities/dataset.entity';
import { Publication } from '../publishing/entities/publication.entity';
import { explainerUrl, publicationUrl } from '../publishing/publication-view';
import { RatingLevel } from '../ratings/entities/rating-level.entity';
import { claimantAsCleared, claimAsCleared, shownWith } from '../verdicts/claim-as-cleared';
import { ClaimSource } from '../sources/entities/claim-source.entity';
import { Working } from '../workings/entities/working.entity';
import { toReaderWorking } from './reader-working';

export const READER_PAGE_SIZE = 20;

/**
 * The reader side's read models, built only from published publications whose time has
 * come: nothing drafted, cleared, scheduled or embargoed is ever read here.
 */
@Injectable()
export class ReaderService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
  ) {}

  site(): ReaderSite {
    return {
      name: this.app.newsroomName,
      origin: this.app.appUrl,
      organisation: this.app.newsroomName,
      timeZone: this.app.deskTimeZone,
    };
  }

  async ratings(): Promise<ReaderRating[]> {
    const levels = await this.dataSource.manager.find(RatingLevel);
    const numbers = levels.flatMap((level) => (level.number === null ? [] : [level.number]));
    const [best, worst] = [Math.max(...numbers, 1), Math.min(...numbers, 1)];
    return levels
      .sort((a, b) => (b.number ?? -1) - (a.number ?? -1))
      .map((level) => ({
        id: level.id,
        number: level.number,
        label: level.label,
        description: level.description,
        isRating: level.isRating,
        bestRating: best,
        worstRating: worst,
      }));
  }

  /** The explainer at `slug`: its latest publication, or publication `sequence`; null if none. */
  async explainer(slug: string, sequence?: number): Promise<ReaderExplainer | null> {
    const manager = this.dataSource.manager;
    const claim = await manager.findOne(Claim, {
      where: { slug },
      relations: { claimant: true, topics: true },
    });
    if (!claim) return null;
    const publications = await manager.find(Publication, {
      where: { claimId: claim.id, state: 'published' },
      relations: { verdictVersion: { claimant: true } },
      order: { sequence: 'ASC' },
    });
    const visible = publications.filter(
      (p) => p.publishedAt && p.publishedAt.getTime() <= Date.now(),
    );
    const latest = visible[visible.length - 1];
    const shown = sequence === undefined ? latest : visible.find((p) => p.sequence === sequence);
    if (!latest || !shown) return null;
    const version = shown.verdictVersion;
    const upToShown = visible.filter((p) => p.sequence <= shown.sequence);
    const notes = this.notesOf(slug, upToShown).reverse();
    const cleared = claimAsCleared(claim, version);
    const claimant = claimantForReaders(claimantAsCleared(claim, version));
    const [ratings, sources, workings, appearances] = await Promise.all([
      this.ratings(),
      this.sources(claim.id, citedSourceIds(version.body), shownWith(version, 'sourceIds')),
      this.workings(claim.id, embeddedWorkingIds(version.body)),
      this.appearances(claim.id, slug, {
        withheld: claimant.name === null,
        shown: shownWith(version, 'appearanceIds'),
      }),
    ]);
    return {
      slug,
      url: explainerUrl(this.app.appUrl, slug),
      versionUrl:
        shown === latest
          ? explainerUrl(this.app.appUrl, slug)
          : publicationUrl(this.app.appUrl, slug, shown.sequence),
      sequence: shown.sequence,
      isLatest: shown === latest,
      claim: {
        text: cleared.text,
        summary: cleared.summary,
        topics: claim.topics.map((topic) => topic.topic).sort(),
      },
      claimant,
      appearances,
      rating: ratings.find((rating) => rating.id === version.ratingId) ?? null,
      bottomLine: version.bottomLine,
      bodyHtml: version.bodyHtml,
      workings,
      sources,
      firstPublishedAt: visible[0]!.publishedAt!.toISOString(),
      publishedAt: shown.publishedAt!.toISOString(),
      modifiedAt: notes[0]?.at ?? null,
      updateNotes: notes,
      retracted: upToShown.some((p) => p.noteKind === 'retraction'),
      publications: visible.map((p) => ({
        sequence: p.sequence,
        publishedAt: p.publishedAt!.toISOString(),
        url: publicationUrl(this.app.appUrl, slug, p.sequence),
        noteKind: p.noteKind,
      })),
    };
  }

  /**
   * Published explainers, newest first (or in the order of `claimIds` when given, as
   * search ranked them), optionally of a topic or a rating. A claim whose first
   * publication is due is published, so the page is read off the claims' index on
   * `first_published_at`; then only its twenty explainers' publications are read, and of
   * their versions only what the index shows (not their bodies).
   */
  async list(options: {
    claimIds?: string[];
    topic?: string;
    rating?: string;
    page?: number;
    pageSize?: number;
  }): Promise<{ items: ReaderExplainerSummary[]; total: number }> {
    if (options.claimIds?.length === 0) return { items: [], total: 0 };
    const query = this.dataSource
      .getRepository(Claim)
      .createQueryBuilder('claim')
      .where('claim.first_published_at <= NOW(3)');
    if (options.claimIds) query.andWhere('claim.id IN (:...ids)', { ids: options.claimIds });
    if (options.topic) {
      query.andWhere(
        'EXISTS (SELECT 1 FROM claim_topics t WHERE t.claim_id = claim.id AND t.topic = :topic)',
        { topic: options.topic },
      );
    }
    if (options.rating) {
      query.andWhere(
        `(SELECT v.rating_id FROM publications p JOIN verdict_versions v ON v.id = p.version_id
           WHERE p.claim_id = claim.id AND p.state = 'published' AND p.published_at <= NOW(3)
           ORDER BY p.sequence DESC LIMIT 1) = :rating`,
        { rating: options.rating },
      );
    }
    const page = options.claimIds ? 1 : (options.page ?? 1);
    const pageSize = options.pageSize ?? READER_PAGE_SIZE;
    const [rows, total] = await Promise.all([
      query
        .clone()
        .select('claim.id', 'id')
        .orderBy('claim.first_published_at', 'DESC')
        .addOrderBy('claim.id', 'ASC')
        .offset((page - 1) * pageSize)
        .limit(pageSize)
        .getRawMany<{ id: string }>(),
      query.getCount(),
    ]);
    const rank = (claimId: string) => options.claimIds?.indexOf(claimId) ?? 0;
    const ids = rows.map((row) => row.id).sort((a, b) => rank(a) - rank(b));
    if (ids.length === 0) return { items: [], total };
    const [claims, history, ratings] = await Promise.all([
      this.dataSource.manager.find(Claim, {
        where: { id: In(ids) },
        relations: { claimant: true, topics: true },
      }),
      this.dataSource.manager.find(Publication, {
        where: { claimId: In(ids), state: 'published', publishedAt: LessThanOrEqual(new Date()) },
        relations: { verdictVersion: { claimant: true } },
        select: {
          id: true,
          claimId: true,
          sequence: true,
          publishedAt: true,
          noteKind: true,
          verdictVersion: {
            id: true,
            ratingId: true,
            bottomLine: true,
            claimSummary: true,
            claimant: { id: true, name: true, kind: true, nameShownPublicly: true },
          },
        },
        order: { sequence: 'ASC' },
      }),
      this.ratings(),
    ]);
    const items = ids.flatMap((id) => {
      const claim = claims.find((candidate) => candidate.id === id);
      const mine = history.filter((publication) => publication.claimId === id);
      const latest = mine[mine.length - 1];
      if (!claim?.slug || !latest) return [];
      const noted = mine.filter((publication) => publication.noteKind);
      return [
        {
          slug: claim.slug,
          url: explainerUrl(this.app.appUrl, claim.slug),
          summary: claimAsCleared(claim, latest.verdictVersion).summary,
          claimantDisplayName: claimantForReaders(claimantAsCleared(claim, latest.verdictVersion))
            .displayName,
          rating: ratings.find((rating) => rating.id === latest.verdictVersion.ratingId) ?? null,
          bottomLine: latest.verdictVersion.bottomLine,
          topics: claim.topics.map((topic) => topic.topic).sort(),
          firstPublishedAt: mine[0]!.publishedAt!.toISOString(),
          modifiedAt: noted[noted.length - 1]?.publishedAt!.toISOString() ?? null,
          retracted: mine.some((publication) => publication.noteKind === 'retraction'),
        },
      ];
    });
    return { items, total };
  }

  /** The topics of published explainers, for the index's filter. */
  async topics(): Promise<string[]> {
    const rows = await this.dataSource.query<Array<{ topic: string }>>(
      `SELECT DISTINCT t.topic FROM claims c
         JOIN claim_topics t ON t.claim_id = c.id
        WHERE c.first_published_at <= NOW(3)
        ORDER BY t.topic`,
    );
    return rows.map((row) => row.topic);
  }

  /** Every published update note across explainers, newest first. */
  async corrections(): Promise<ReaderCorrection[]> {
    const publications = await this.dataSource
      .getRepository(Publication)
      .createQueryBuilder('p')
      .innerJoinAndSelect('p.claim', 'claim')
      .innerJoin('p.verdictVersion', 'version')
      .addSelect(['version.id', 'version.claimSummary'])
      .where("p.state = 'published' AND p.published_at <= NOW(3) AND p.note_kind IS NOT NULL")
      .orderBy('claim.first_published_at', 'DESC')
      .addOrderBy('claim.id', 'ASC')
      .take(500)
      .getMany();
    return publications.map((p) => ({
      slug: p.claim.slug!,
      url: explainerUrl(this.app.appUrl, p.claim.slug!),
      summary: claimAsCleared(p.claim, p.verdictVersion).summary,
      note: this.noteOf(p.claim.slug!, p),
    }));
  }

  /**
   * The archived capture of an appearance of a published claim, for readers; null for
   * anything else (unpublished claims' files stay on the desk).
   */
  async publishedCapture(slug: string, attachmentId: string): Promise<Attachment | null> {
    const claim = await this.dataSource.manager.findOne(Claim, {
      where: { slug },
      relations: { claimant: true },
    });
    if (!claim || claim.status === 'set_aside') return null;
    const latest = await this.dataSource.manager.findOne(Publication, {
      where: { claimId: claim.id, state: 'published', publishedAt: LessThanOrEqual(new Date()) },
      relations: { verdictVersion: { claimant: true } },
      // Who said it and which appearances it had, not the explainer's body.
      select: {
        id: true,
        sequence: true,
        verdictVersion: {
          id: true,
          clearedParts: true,
          claimant: { id: true, name: true, kind: true, nameShownPublicly: true },
        },
      },
      order: { sequence: 'DESC' },
    });
    if (!latest) return null;
    // A capture of a private individual's post shows who they are: withheld with the name.
    const claimant = claimantAsCleared(claim, latest.verdictVersion);
    if (claimantForReaders(claimant).name === null) return null;
    const appearances = await this.dataSource.manager.find(Appearance, {
      where: { claimId: claim.id, captureAttachmentId: attachmentId },
      select: { id: true },
    });
    const shown = shownWith(latest.verdictVersion, 'appearanceIds');
    if (!appearances.some((appearance) => shown(appearance.id))) return null;
    return this.dataSource.manager.findOne(Attachment, { where: { id: attachmentId } });
  }

  private notesOf(slug: string, publications: Publication[]): ReaderUpdateNote[] {
    return publications.filter((p) => p.noteKind).map((p) => this.noteOf(slug, p));
  }

  private noteOf(slug: string, publication: Publication): ReaderUpdateNote {
    return {
      kind: publication.noteKind!,
      kindLabel: updateNoteKindLabels[publication.noteKind!],
      text: publication.noteText ?? '',
      at: publication.publishedAt!.toISOString(),
      sequence: publication.sequence,
      url: publicationUrl(this.app.appUrl, slug, publication.sequence),
    };
  }

  /**
   * The claim's sources readers are shown: cited ones first, numbered in order of first
   * citation, then the rest.
   */
  private async sources(
    claimId: string,
    cited: string[],
    shown: (sourceId: string) => boolean,
  ): Promise<ReaderSource[]> {
    const links = (
      await this.dataSource.manager.find(ClaimSource, {
        where: { claimId },
        relations: { source: true },
        order: { linkedAt: 'ASC' },
      })
    ).filter((link) => shown(link.sourceId) || cited.includes(link.sourceId));
    const order = (id: string) => {
      const index = cited.indexOf(id);
      return index < 0 ? cited.length : index;
    };
    return links
      .sort((a, b) => order(a.sourceId) - order(b.sourceId))
      .map(({ source }, index) => ({
        number: index + 1,
        id: source.id,
        title: source.title,
        authors: source.authors,
        publisher: source.publisher,
        year: source.year,
        doi: source.doi,
        url: source.url,
        kind: source.kind,
        kindLabel: sourceKindLabels[source.kind],
        grade: source.grade,
        gradeLabel: reliabilityGradeLabels[source.grade],
        gradeReason: source.gradeReason,
      }));
  }

  private async workings(claimId: string, ids: string[]) {
    if (ids.length === 0) return [];
    const workings = await this.dataSource.manager.find(Working, {
      where: { claimId, id: In(ids) },
    });
    const datasetIds = workings.flatMap((w) =>
      Object.values(w.datasetRefs ?? {}).flatMap((refs) => refs.map((ref) => ref.dataset)),
    );
    const datasets = datasetIds.length
      ? await this.dataSource.manager.find(Dataset, {
          where: { id: In(datasetIds) },
          select: { id: true, name: true },
        })
      : [];
    const names = new Map(datasets.map((d) => [d.id, d.name]));
    return ids
      .map((id) => workings.find((w) => w.id === id))
      .filter((w): w is Working => w !== undefined)
      .map((w) => toReaderWorking(w, names));
  }

  /**
   * Where the claim was seen, of the appearances readers are shown (`shown`). `withheld`:
   * the claimant is a private individual readers may not name, and an address or a capture
   * (their profile, their post) could name them, so only the outlet and the time are given.
   */
  private async appearances(
    claimId: string,
    slug: string,
    { withheld, shown }: { withheld: boolean; shown: (appearanceId: string) => boolean },
  ): Promise<ReaderAppearance[]> {
    const appearances = (
      await this.dataSource.manager.find(Appearance, {
        where: { claimId },
        order: { seenAt: 'ASC', id: 'ASC' },
      })
    ).filter((appearance) => shown(appearance.id));
    return appearances.map((appearance) => ({
      outlet: appearance.outlet,
      seenAt: appearance.seenAt.toISOString(),
      seenTimeZone: appearance.seenTimeZone,
      isFirstKnown: appearance.isFirstKnown,
      url: withheld ? null : appearance.url,
      captureUrl:
        appearance.captureAttachmentId && !withheld
          ? `${explainerUrl(this.app.appUrl, slug)}/captures/${appearance.captureAttachmentId}`
          : null,
    }));
  }
}
