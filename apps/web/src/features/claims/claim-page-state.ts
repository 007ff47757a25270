import type { Notice } from '@/components/ui/live-notice';

/** What a screen hands the claim page when it sends someone there, e.g. after filing. */
export interface ClaimPageState {
  notice?: Notice;
}

export function claimPageNotice(state: unknown): Notice | null {
  if (typeof state !== 'object' || state === null || !('notice' in state)) return null;
  return (state as ClaimPageState).notice ?? null;
}
