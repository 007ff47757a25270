export * from './errors.js';
export * from './roles.js';
export * from './auth.js';
export * from './users.js';
export * from './health.js';
