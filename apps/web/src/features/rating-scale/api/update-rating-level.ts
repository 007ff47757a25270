import type { RatingLevelView, UpdateRatingLevelRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useRefreshingMutation } from '@/lib/use-refreshing-mutation';
import { ratingLevelKeys } from './rating-level-keys';

export type UpdateRatingLevelInput = UpdateRatingLevelRequest & { id: string };

/** Only the words of a level change: its label and description, with the version last seen. */
export function updateRatingLevel({
  id,
  ...body
}: UpdateRatingLevelInput): Promise<RatingLevelView> {
  return api.patch<RatingLevelView>(`/rating-levels/${encodeURIComponent(id)}`, body);
}

export function useUpdateRatingLevel() {
  return useRefreshingMutation([ratingLevelKeys.all], updateRatingLevel);
}
