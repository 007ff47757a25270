import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, In, type FindOptionsWhere } from 'typeorm';
import { Claim } from '../claims/entities/claim.entity';
import { Source } from '../sources/entities/source.entity';
import { documentId, type SearchDocument } from './search-document';

const BATCH = 5_000;

export function claimDocument(claim: Claim): SearchDocument {
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

  /** Every document, read in batches of 5 000 so memory stays flat at 100 000 claims. */
  async *all(): AsyncGenerator<SearchDocument[]> {
    for (let offset = 0; ; offset += BATCH) {
      const claims = await this.dataSource.getRepository(Claim).find({
        relations: { claimant: true, topics: true },
        order: { id: 'ASC' },
        skip: offset,
        take: BATCH,
      });
      if (claims.length === 0) break;
      yield claims.map(claimDocument);
    }
    for (let offset = 0; ; offset += BATCH) {
      const sources = await this.dataSource
        .getRepository(Source)
        .find({ order: { id: 'ASC' }, skip: offset, take: BATCH });
      if (sources.length === 0) break;
      yield sources.map(sourceDocument);
    }
  }

  private async readClaims(where: FindOptionsWhere<Claim>): Promise<SearchDocument[]> {
    const claims = await this.dataSource.getRepository(Claim).find({
      where,
      relations: { claimant: true, topics: true },
    });
    return claims.map(claimDocument);
  }
}
