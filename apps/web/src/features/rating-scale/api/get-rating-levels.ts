import type { RatingLevelView } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ratingLevelKeys } from './rating-level-keys';

/** The desk's rating scale, best-holding level first, non-rating outcomes last. */
export function getRatingLevels(): Promise<RatingLevelView[]> {
  return api.get<RatingLevelView[]>('/rating-levels');
}

export const ratingLevelsQueryOptions = () =>
  queryOptions({
    queryKey: ratingLevelKeys.list(),
    queryFn: getRatingLevels,
    // The scale changes rarely, and only by a desk chief's hand on its own page.
    staleTime: 5 * 60_000,
  });

export function useRatingLevels() {
  return useSuspenseQuery(ratingLevelsQueryOptions());
}

/** "3 · Stretched", or the label alone for an outcome that is not a rating. */
export function ratingLevelName(level: Pick<RatingLevelView, 'number' | 'label'>): string {
  return level.number === null ? level.label : `${level.number} · ${level.label}`;
}
