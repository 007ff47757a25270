import type { z } from 'zod';

type UrlQuery<Shape extends z.ZodRawShape> = Partial<z.output<z.ZodObject<Shape>>>;

/**
 * The fields of a request schema read from a page's URL, each checked by its own rule. A
 * parameter that fails its rule (a hand-edited `?status=lost`) is dropped on its own, so
 * the rest of a shared view still applies.
 */
export function readUrlQuery<Shape extends z.ZodRawShape>(
  schema: z.ZodObject<Shape>,
  searchParams: URLSearchParams,
): UrlQuery<Shape> {
  const query: Record<string, unknown> = {};
  for (const [key, field] of Object.entries(schema.shape)) {
    const raw = searchParams.get(key);
    if (raw === null || raw === '') continue;
    const parsed = (field as z.ZodType).safeParse(raw);
    if (parsed.success && parsed.data !== undefined) query[key] = parsed.data;
  }
  return query as UrlQuery<Shape>;
}

/** The URL search parameters for a view, in the schema's order, leaving out unset and default values. */
export function writeUrlQuery<Shape extends z.ZodRawShape>(
  schema: z.ZodObject<Shape>,
  query: UrlQuery<Shape>,
  defaults: UrlQuery<Shape> = {},
): URLSearchParams {
  const params = new URLSearchParams();
  for (const key of Object.keys(schema.shape) as (keyof UrlQuery<Shape> & string)[]) {
    const value = query[key];
    if (value === undefined || value === defaults[key]) continue;
    params.set(key, String(value));
  }
  return params;
}
