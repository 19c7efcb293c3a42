export * from './growth-models.js';
export * from './curve-fit-types.js';
export { fitCurve } from './fit-curve.js';
export {
  fitLeastSquares,
  fitWithPackageOnly,
  type DataPoint,
  type LeastSquaresOptions,
  type LeastSquaresResult,
  type ModelFunction,
  type ModelGradient,
} from './least-squares.js';
export { growthStartingValues, type GrowthStart } from './starting-values.js';
