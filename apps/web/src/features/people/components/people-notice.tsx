import { changeErrorMessage } from '@/lib/api-error-messages';

export type { Notice, ShowNotice } from '@/components/ui/live-notice';
export { LiveNotice as PeopleNotice } from '@/components/ui/live-notice';

export const staleUserMessage = 'Someone else changed this person — reloaded.';

/** Words for a failed change to a person: stale version, a broken rule, or anything else. */
export function describeUserChangeError(error: unknown): string {
  return changeErrorMessage(error, staleUserMessage);
}
