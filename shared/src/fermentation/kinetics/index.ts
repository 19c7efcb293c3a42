export * from './types.js';
export * from './priors.js';
export { dilution } from './feedings.js';
export { fitCultureKinetics, defaultKinetics } from './fit-kinetics.js';
export { predictNextPeak, nextFeedingSeries, type PredictOptions } from './predict.js';
export { studentTQuantile } from './student-t.js';
