import { changeErrorMessage } from '@/lib/api-error-messages';

export type { ShowNotice } from '@/components/ui/toaster';

export const staleUserMessage = 'Someone else changed this person — reloaded.';

/** Words for a failed change to a person: stale version, a broken rule, or anything else. */
export function describeUserChangeError(error: unknown): string {
  return changeErrorMessage(error, staleUserMessage);
}
