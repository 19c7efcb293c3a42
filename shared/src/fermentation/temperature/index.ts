export * from './models.js';
export * from './fit.js';
export * from './series.js';
export * from './integrate.js';
export * from './time.js';
export * from './kitchen.js';
