export * from './types.js';
export {
  inoculation,
  rateFactors,
  defaultTargetRisePct,
  totalFlour,
  SALT_LIMIT_PCT,
  SUGAR_FREE_PCT,
  SUGAR_SLOWDOWN_PER_PCT,
  FAT_SLOWDOWN_PER_PCT,
  MILK_SLOWDOWN_PER_PCT,
} from './dough.js';
export { growthForRise, riseForGrowth } from './rise-model.js';
export { predictBulkEnd, DEFAULT_PEAK_RISE_PCT, DOUGH_TRANSFER_SD, READING_SD_PCT } from './bulk-end.js';
