import fc from 'fast-check';

// Property tests draw the same cases on every run, so a failure in CI reproduces here.
// Set FC_SEED to explore other cases (fast-check prints the seed of any failure). The
// library's tsconfig has no Node types, hence the look-up through globalThis.
const environment = (globalThis as { process?: { env: Record<string, string | undefined> } })
  .process?.env;
fc.configureGlobal({ seed: Number(environment?.FC_SEED ?? 20261201) });
