export * from './bakers-math-error.js';
export * from './measure-units.js';
export * from './food-catalogue.js';
export * from './grams-from-measure.js';
