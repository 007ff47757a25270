import { api } from '@/lib/api-client';
import { useRefreshingMutation } from '@/lib/use-refreshing-mutation';
import { ratingLevelKeys } from './rating-level-keys';

/** Takes a level off the scale; the API refuses (409) while a verdict uses it. */
export function deleteRatingLevel(id: string): Promise<void> {
  return api.delete(`/rating-levels/${encodeURIComponent(id)}`);
}

export function useDeleteRatingLevel() {
  return useRefreshingMutation([ratingLevelKeys.all], deleteRatingLevel);
}
