import type { PublicationView, UpdateNoteKind } from '@skyledger/contracts';
import { formatDateTime } from '@/lib/format-date';

export const publicationStateLabels: Record<PublicationView['state'], string> = {
  scheduled: 'Scheduled',
  published: 'Published',
  cancelled: 'Schedule cancelled',
};

// The colour only repeats what the words say; the words are always there.
export const publicationStateColors = {
  scheduled: 'amber',
  published: 'jade',
  cancelled: 'gray',
} as const satisfies Record<PublicationView['state'], string>;

/** When to choose each kind of update note, shown under the choice. */
export const updateNoteKindHints: Record<UpdateNoteKind, string> = {
  correction: 'Something we published was wrong and is now put right.',
  clarification: 'Nothing was wrong, but something was unclear and is now said better.',
  update: 'Something new since publication: new data, or a reply from the claimant.',
  rating_change: 'The rating itself changes; say from what to what, and why.',
  retraction: 'We withdraw the explainer. The page stays up, with this note at its top.',
};

/** "5 Dec 2026, 09:00 GMT (Europe/London)": a scheduled instant on the clock it was set on. */
export function inItsZone(instant: string, timeZone: string): string {
  return `${formatDateTime(instant, timeZone)} (${timeZone.replaceAll('_', ' ')})`;
}

/**
 * The reader page of the explainer, which always shows its latest publication. Null while
 * nothing is published.
 */
export function readerPageUrl(publications: readonly PublicationView[]): string | null {
  return publications.find((publication) => publication.state === 'published')?.readerUrl ?? null;
}
