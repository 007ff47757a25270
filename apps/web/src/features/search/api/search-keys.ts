import type { SearchQuery } from '@skyledger/contracts';

export const searchKeys = {
  all: ['search'] as const,
  results: () => [...searchKeys.all, 'results'] as const,
  result: (query: SearchQuery) => [...searchKeys.results(), query] as const,
  similarClaims: (text: string) => [...searchKeys.all, 'similar-claims', text] as const,
};
