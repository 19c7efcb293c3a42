export * from './contracts/errors.js';
export * from './contracts/account.js';
export * from './contracts/health.js';
export * from './units.js';
