export * from './types.js';
export { planBake } from './plan-bake.js';
export { replanBake } from './replan.js';
export { instantAtLocal } from './zone.js';
export { doughTemperatureForBulkEnd, type DoughTemperatureRequest, type DoughTemperatureAnswer } from './lever.js';
export { CAUTION_TEXT, cautionsFor } from './cautions.js';
export { DEFAULTS as PLAN_DEFAULTS, PROOF_SHARE_OF_BULK } from './defaults.js';
