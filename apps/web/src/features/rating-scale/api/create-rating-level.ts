import type { CreateRatingLevelRequest, RatingLevelView } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useRefreshingMutation } from '@/lib/use-refreshing-mutation';
import { ratingLevelKeys } from './rating-level-keys';

export function createRatingLevel(body: CreateRatingLevelRequest): Promise<RatingLevelView> {
  return api.post<RatingLevelView>('/rating-levels', body);
}

export function useCreateRatingLevel() {
  return useRefreshingMutation([ratingLevelKeys.all], createRatingLevel);
}
