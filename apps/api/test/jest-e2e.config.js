const base = require('../jest.config.js');

/** @type {import('jest').Config} */
module.exports = {
  ...base,
  testRegex: 'test/.*\\.e2e-spec\\.ts$',
  // Each suite creates its own database and app; two at a time suits a two-core machine.
  maxWorkers: 2,
  testTimeout: 30_000,
};
