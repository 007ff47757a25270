import { type PublicationView } from '@skyledger/contracts';
import { type Publication } from './entities/publication.entity';

/** Needs `verdictVersion` loaded. */
export function toPublicationView(
  publication: Publication,
  slug: string | null,
  appUrl: string,
): PublicationView {
  return {
    id: publication.id,
    versionNumber: publication.verdictVersion.number,
    sequence: publication.sequence,
    state: publication.state,
    scheduledFor: publication.scheduledFor?.toISOString() ?? null,
    scheduledTimeZone: publication.scheduledTimeZone,
    publishedAt: publication.publishedAt?.toISOString() ?? null,
    note: publication.noteKind
      ? { kind: publication.noteKind, text: publication.noteText ?? '' }
      : null,
    url: slug ? publicationUrl(appUrl, slug, publication.sequence) : '',
    readerUrl: slug ? explainerUrl(appUrl, slug) : null,
  };
}

/** The reader's address of an explainer: always its latest publication. */
export function explainerUrl(appUrl: string, slug: string): string {
  return `${appUrl}/explainers/${slug}`;
}

/** The address of one publication, which stays readable after later ones. */
export function publicationUrl(appUrl: string, slug: string, sequence: number): string {
  return `${explainerUrl(appUrl, slug)}/v/${sequence}`;
}
