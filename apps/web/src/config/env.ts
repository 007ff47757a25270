import { z } from 'zod';

const envSchema = z.object({
  /** Where the API lives; same origin by default, so the refresh cookie (path /api/auth) is sent. */
  VITE_API_URL: z
    .string()
    .regex(/^(\/|https?:\/\/)/, { error: 'must be a path such as /api or an http(s) URL' })
    .default('/api')
    .transform((url) => url.replace(/\/+$/, '')),
});

function parseEnv() {
  const parsed = envSchema.safeParse(import.meta.env);
  if (!parsed.success) {
    throw new Error(`The desk's build configuration is invalid:\n${z.prettifyError(parsed.error)}`);
  }
  return { apiUrl: parsed.data.VITE_API_URL };
}

export const env = parseEnv();
