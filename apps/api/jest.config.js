// Shared by the unit (src/**/*.spec.ts) and end-to-end (test/**/*.e2e-spec.ts) suites.
// NestJS 12 ships ES modules only: Jest on Node 20 transforms them with swc (STACK.md).
const esmPackages = [
  '@nestjs',
  'uid',
  'load-esm',
  'file-type',
  'strtok3',
  'token-types',
  '@tokenizer',
  'uint8array-extras',
  'meilisearch',
  'happy-dom',
  'feed',
  '@borewit',
  'parse5',
  'entities',
];

/** @type {import('jest').Config} */
module.exports = {
  rootDir: __dirname,
  testEnvironment: 'node',
  testRegex: 'src/.*\\.spec\\.tsx?$',
  moduleFileExtensions: ['ts', 'tsx', 'js', 'json'],
  transformIgnorePatterns: [`/node_modules/(?!(${esmPackages.join('|')})/)`],
  transform: {
    // swc rather than ts-jest: it emits CommonJS for every file, including the ES-module
    // workspace packages read from source, and keeps Nest's decorator metadata.
    '^.+\\.ts$': [
      '@swc/jest',
      {
        jsc: {
          parser: { syntax: 'typescript', decorators: true },
          transform: { legacyDecorator: true, decoratorMetadata: true },
          target: 'es2022',
          keepClassNames: true,
        },
        module: { type: 'commonjs' },
      },
    ],
    // The reader pages are React components rendered to HTML on the server.
    '^.+\\.tsx$': [
      '@swc/jest',
      {
        jsc: {
          parser: { syntax: 'typescript', tsx: true },
          transform: { react: { runtime: 'automatic' } },
          target: 'es2022',
        },
        module: { type: 'commonjs' },
      },
    ],
    '^.+\\.js$': [
      '@swc/jest',
      {
        jsc: { parser: { syntax: 'ecmascript' }, target: 'es2022', keepClassNames: true },
        module: { type: 'commonjs' },
      },
    ],
  },
  // The workspace packages are read from their TypeScript source, so no build is needed first.
  moduleNameMapper: {
    '^@skyledger/contracts$': '<rootDir>/../../packages/contracts/src/index.ts',
    '^@skyledger/calc$': '<rootDir>/../../calc-library/src/index.ts',
    '^@skyledger/devstack/(.*)$': '<rootDir>/../../packages/devstack/src/$1.ts',
    '^(\\.{1,2}/.*)\\.js$': '$1',
  },
};
