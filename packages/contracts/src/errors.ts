/**
 * The one shape of every error the API returns. `fields` maps a request field (dotted
 * path for nested ones, e.g. `appearance.url`) to the code of the rule it broke
 * (`isEmail`, `minLength`, `stale`, ...); `message` says the same in words.
 */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  fields?: Record<string, string>;
}

export function isApiErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null) return false;
  const body = value as Record<string, unknown>;
  return typeof body.statusCode === 'number' && typeof body.message === 'string';
}
