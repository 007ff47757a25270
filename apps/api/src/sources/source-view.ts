import { type ClaimSourceView, type SourceView } from '@skyledger/contracts';
import { toPersonRef } from '../common/views/person-ref';
import { type ClaimSource } from './entities/claim-source.entity';
import { type Source } from './entities/source.entity';

/** Needs `createdBy` loaded. */
export function toSourceView(source: Source): SourceView {
  return {
    id: source.id,
    title: source.title,
    authors: source.authors,
    publisher: source.publisher,
    year: source.year,
    doi: source.doi,
    url: source.url,
    accessedOn: source.accessedOn,
    kind: source.kind,
    grade: source.grade,
    gradeReason: source.gradeReason,
    addedBy: toPersonRef(source.createdBy),
    createdAt: source.createdAt.toISOString(),
    version: source.version,
  };
}

/** Needs `source.createdBy` and `linkedBy` loaded. */
export function toClaimSourceView(link: ClaimSource): ClaimSourceView {
  return {
    ...toSourceView(link.source),
    linkedBy: toPersonRef(link.linkedBy),
    linkedAt: link.linkedAt.toISOString(),
  };
}
