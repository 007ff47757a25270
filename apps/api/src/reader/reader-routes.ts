/**
 * The reader side's paths, outside the API's `/api` prefix and outside the desk's
 * single-page fallback. Path-to-regexp patterns, as Nest and serve-static read them.
 */
export const readerRoutePatterns = [
  'explainers',
  'explainers/{*path}',
  'corrections',
  'methodology',
  'feeds/{*path}',
  'oembed',
  'reader/{*path}',
] as const;
