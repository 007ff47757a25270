import { z } from 'zod';

/**
 * Zod builds faster parsers with `new Function` when the page allows it, and first probes
 * whether it may. The desk's Content-Security-Policy allows no eval, so the probe is refused
 * and reported as a policy violation on every page. Imported first by main.tsx, before any
 * schema is used, so the probe never runs.
 */
z.config({ jitless: true });
