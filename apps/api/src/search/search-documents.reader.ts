import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, In, type FindOptionsWhere } from 'typeorm';
import { claimantForReaders } from '../claimants/claimant-view';
import { ClaimTopic } from '../claims/entities/claim-topic.entity';
import { Claim } from '../claims/entities/claim.entity';
import { explainerPlainText } from '@skyledger/explainer';
import { Publication } from '../publishing/entities/publication.entity';
import { Source } from '../sources/entities/source.entity';
import { claimantAsCleared, claimAsCleared } from '../verdicts/claim-as-cleared';
import { documentId, type SearchDocument } from './search-document';

const BATCH = 5_000;

/** What a claim's search document is made of: the entity, or a lean row read for a rebuild. */
export type SearchedClaim = Pick<Claim, 'id' | 'summary' | 'text' | 'status' | 'createdAt'> & {
  claimant: Pick<Claim['claimant'], 'name'>;
  topics: Array<{ topic: string }>;
};

export function claimDocument(claim: SearchedClaim): SearchDocument {
  const topicList = claim.topics.map((topic) => topic.topic).sort();
  return {
    id: documentId('claim', claim.id),
    type: 'claim',
    entityId: claim.id,
    title: claim.summary,
    text: claim.text,
    claimant: claim.claimant.name,
    topics: topicList.join(' '),
    topicList,
    authors: '',
    publisher: '',
    body: '',
    status: claim.status,
    rating: null,
    date: claim.createdAt.getTime(),
    audience: 'desk',
  };
}

export function sourceDocument(source: Source): SearchDocument {
  return {
    id: documentId('source', source.id),
    type: 'source',
    entityId: source.id,
    title: source.title,
    text: '',
    claimant: '',
    topics: '',
    topicList: [],
    authors: source.authors ?? '',
    publisher: source.publisher ?? '',
    body: '',
    status: null,
    rating: null,
    date: source.createdAt.getTime(),
    audience: 'desk',
  };
}

/** A published explainer, as readers may find it: the latest publication of a claim. */
export function explainerDocument(publication: Publication): SearchDocument {
  const { claim, verdictVersion: version } = publication;
  const topicList = claim.topics.map((topic) => topic.topic).sort();
  return {
    id: documentId('explainer', claim.id),
    type: 'explainer',
    entityId: claim.id,
    title: claimAsCleared(claim, version).summary,
    text: version.bottomLine,
    claimant: claimantForReaders(claimantAsCleared(claim, version)).name ?? '',
    topics: topicList.join(' '),
    topicList,
    authors: '',
    publisher: '',
    body: explainerPlainText(version.body),
    status: 'published',
    rating: version.ratingId,
    date: publication.publishedAt!.getTime(),
    audience: 'public',
  };
}

/** Reads what the search index holds from MariaDB: everything, or the records that changed. */
@Injectable()
export class SearchDocumentsReader {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  claims(ids: string[]): Promise<SearchDocument[]> {
    return this.readClaims({ id: In(ids) });
  }

  claimsOfClaimant(claimantId: string): Promise<SearchDocument[]> {
    return this.readClaims({ claimantId });
  }

  async sources(ids: string[]): Promise<SearchDocument[]> {
    const sources = await this.dataSource.getRepository(Source).findBy({ id: In(ids) });
    return sources.map(sourceDocument);
  }

  /** The latest publication of each of these claims, as explainer documents. */
  async explainers(claimIds: string[]): Promise<SearchDocument[]> {
    if (claimIds.length === 0) return [];
    const publications = await this.latestPublications()
      .andWhere('p.claim_id IN (:...claimIds)', { claimIds })
      .getMany();
    return publications.map(explainerDocument);
  }

  /** The live explainer of each of these claims that has one: its slug and its rating. */
  async liveExplainers(
    claimIds: string[],
  ): Promise<Array<{ claimId: string; slug: string; ratingId: string | null }>> {
    if (claimIds.length === 0) return [];
    return this.latestPublications()
      .andWhere('p.claim_id IN (:...claimIds)', { claimIds })
      .select(['claim.id AS claimId', 'claim.slug AS slug', 'version.rating_id AS ratingId'])
      .getRawMany();
  }

  /**
   * Every document, read in batches of 5 000 so memory stays flat at 100 000 claims.
   * Claims are read after the last id of the batch before (not by OFFSET, which rereads
   * every earlier row) and as plain rows: entities with their relations made the rebuild
   * at 100 000 claims take most of a cold start (npm run bench).
   */
  async *all(): AsyncGenerator<SearchDocument[]> {
    for (let after: string | null = null; ;) {
      const query = this.dataSource
        .getRepository(Claim)
        .createQueryBuilder('claim')
        .innerJoin('claim.claimant', 'claimant')
        .select(['claim.id AS id', 'claim.summary AS summary', 'claim.text AS text'])
        .addSelect(['claim.status AS status', 'claim.created_at AS createdAt'])
        .addSelect('claimant.name', 'claimantName')
        .orderBy('claim.id', 'ASC')
        .limit(BATCH);
      if (after) query.where('claim.id > :after', { after });
      const rows = await query.getRawMany<
        Omit<SearchedClaim, 'claimant' | 'topics'> & { claimantName: string }
      >();
      if (rows.length === 0) break;
      after = rows[rows.length - 1]!.id;
      const topics = new Map<string, Array<{ topic: string }>>();
      const tags = await this.dataSource.getRepository(ClaimTopic).find({
        select: { claimId: true, topic: true },
        where: { claimId: In(rows.map((row) => row.id)) },
      });
      for (const { claimId, topic } of tags) {
        topics.set(claimId, [...(topics.get(claimId) ?? []), { topic }]);
      }
      yield rows.map(({ claimantName, ...row }) =>
        claimDocument({
          ...row,
          claimant: { name: claimantName },
          topics: topics.get(row.id) ?? [],
        }),
      );
    }
    for (let offset = 0; ; offset += BATCH) {
      const publications = await this.latestPublications()
        .orderBy('p.id', 'ASC')
        .skip(offset)
        .take(BATCH)
        .getMany();
      if (publications.length === 0) break;
      yield publications.map(explainerDocument);
    }
    for (let offset = 0; ; offset += BATCH) {
      const sources = await this.dataSource
        .getRepository(Source)
        .find({ order: { id: 'ASC' }, skip: offset, take: BATCH });
      if (sources.length === 0) break;
      yield sources.map(sourceDocument);
    }
  }

  /** Published publications with no later published one for the same claim. */
  private latestPublications() {
    return this.dataSource
      .getRepository(Publication)
      .createQueryBuilder('p')
      .innerJoinAndSelect('p.claim', 'claim')
      .innerJoinAndSelect('claim.claimant', 'claimant')
      .leftJoinAndSelect('claim.topics', 'topic')
      .innerJoinAndSelect('p.verdictVersion', 'version')
      .leftJoinAndSelect('version.claimant', 'clearedClaimant')
      .where("p.state = 'published'")
      .andWhere(
        "NOT EXISTS (SELECT 1 FROM publications later WHERE later.claim_id = p.claim_id AND later.state = 'published' AND later.sequence > p.sequence)",
      );
  }

  private async readClaims(where: FindOptionsWhere<Claim>): Promise<SearchDocument[]> {
    const claims = await this.dataSource.getRepository(Claim).find({
      where,
      relations: { claimant: true, topics: true },
    });
    return claims.map(claimDocument);
  }
}
