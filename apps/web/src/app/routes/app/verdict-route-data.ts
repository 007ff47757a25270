import { uuidSchema } from '@skyledger/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs } from 'react-router-dom';
import { sessionQueryOptions } from '@/features/auth/api/get-session';
import { claimQueryOptions } from '@/features/claims/api/get-claim';
import { ratingLevelsQueryOptions } from '@/features/rating-scale/api/get-rating-levels';
import { calculatorsQueryOptions } from '@/features/workings/api/get-calculators';
import { claimWorkingsQueryOptions } from '@/features/workings/api/get-claim-workings';
import { isApiError } from '@/lib/api-client';

/**
 * Fills the cache for a page about one claim's verdict: the claim, the rating scale and
 * what the page names (`more`); the workings start loading without holding the page.
 */
export function verdictPageLoader(
  queryClient: QueryClient,
  more: (claimId: string) => Promise<unknown>,
) {
  return async ({ params }: LoaderFunctionArgs) => {
    // Loaders run side by side with the frame's: ask for nothing until there is a session.
    if (!(await queryClient.ensureQueryData(sessionQueryOptions()))) return null;
    const claimId = params.claimId ?? '';
    // An address that names no claim is a page that does not exist, not a failed page.
    if (!uuidSchema.safeParse(claimId).success) throw data(null, { status: 404 });
    void queryClient.prefetchQuery(claimWorkingsQueryOptions(claimId));
    void queryClient.prefetchQuery(calculatorsQueryOptions());
    await Promise.all([
      queryClient.ensureQueryData(claimQueryOptions(claimId)).catch((error: unknown) => {
        throw isApiError(error) && error.status === 404 ? data(null, { status: 404 }) : error;
      }),
      queryClient.ensureQueryData(ratingLevelsQueryOptions()),
      more(claimId),
    ]);
    return null;
  };
}
