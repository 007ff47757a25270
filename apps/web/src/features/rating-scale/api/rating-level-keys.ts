export const ratingLevelKeys = {
  all: ['rating-levels'] as const,
  list: () => [...ratingLevelKeys.all, 'list'] as const,
};
