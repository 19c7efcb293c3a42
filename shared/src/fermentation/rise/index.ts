export * from './rise-types.js';
export { fitRise, MIN_READINGS, MAX_RELATIVE_SE_OF_RISE } from './fit-rise.js';
export { PEAK_FRACTION, READY_FROM_FRACTION, PEAK_INTERVAL_LEVEL } from './peak-window.js';
export { FALL_MIN_MM, FALL_FRACTION_OF_RISE, MIN_RISE_FRACTION } from './rise-readings.js';
export { parseIsoWithOffset, toIso } from './iso-time.js';
