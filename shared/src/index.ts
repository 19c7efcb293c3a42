export * from './contracts/errors.js';
export * from './contracts/account.js';
export * from './contracts/health.js';
export * from './contracts/paging.js';
export * from './contracts/culture.js';
export * from './contracts/culture-amounts.js';
export * from './contracts/idempotency.js';
export * from './units.js';
