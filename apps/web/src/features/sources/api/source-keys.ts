export const sourceKeys = {
  all: ['sources'] as const,
  searches: () => [...sourceKeys.all, 'search'] as const,
  search: (q: string) => [...sourceKeys.searches(), q] as const,
};
