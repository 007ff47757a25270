import { z } from 'zod/v4';

/**
 * The desk's `zod`: vite.config.ts resolves every `import … from 'zod'` in the bundle
 * (ours, the contracts', the form resolvers') to this module. Zod builds faster parsers
 * with `new Function` when the page allows it and probes whether it may when an object
 * schema is defined; the desk's Content-Security-Policy allows no eval, so the probe is
 * refused and reported as a policy violation. Configured here, before any importer's
 * schemas exist, whatever order the bundler puts its chunks in (a flag set from main.tsx
 * came too late once a chunk of schemas was loaded ahead of it).
 */
z.config({ jitless: true });

export * from 'zod/v4';
export { z as default } from 'zod/v4';
