export * from './types.js';
export { parseLoggerTime, detectDateFormat, hasOffset } from './dates.js';
export {
  headerWords,
  looksLikeTime,
  looksLikeTemperature,
  unitFromHeader,
  unitFromValues,
  parseLoggerNumber,
  findHeaderRow,
  guessLoggerMapping,
} from './columns.js';
export { LoggerCollector, batches, type LoggerReading, type LoggerCollection, type LoggerWindow } from './readings.js';
