export { startTestStack, type TestStack } from './test-stack.js';
export { TestDatabase, databaseAccess } from './test-database.js';
export { tmpDir, repoRoot } from './paths.js';
