import { auditQuerySchema, type AuditQuery } from '@skyledger/contracts';
import { readUrlQuery, writeUrlQuery } from '@/lib/url-query';

/** The audit trail's filters and page, as the page's URL holds them. */
export function parseAuditSearch(searchParams: URLSearchParams): AuditQuery {
  return readUrlQuery(auditQuerySchema, searchParams);
}

export function auditSearchParams(query: AuditQuery): URLSearchParams {
  return writeUrlQuery(auditQuerySchema, query, { page: 1 });
}

/** The query's filters as request parameters, without the page: what the export takes. */
export function auditFilterParams(query: AuditQuery): Record<string, string | undefined> {
  const { page: _page, ...filters } = query;
  return { ...filters };
}
