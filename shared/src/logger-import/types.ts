// A kitchen temperature logger's CSV export, read into the readings a feeding keeps. The file is
// tokenised by papaparse (in the browser); everything here works on cells and is pure.

/** How the timestamps of a file are written. */
export const LOGGER_DATE_FORMATS = ['iso', 'dmy', 'mdy', 'unix-s', 'unix-ms'] as const;
export type LoggerDateFormat = (typeof LOGGER_DATE_FORMATS)[number];

export const LOGGER_DATE_FORMAT_LABELS: Record<LoggerDateFormat, string> = {
  iso: 'Year first (2026-11-28 07:15 or ISO 8601)',
  dmy: 'Day first (28/11/2026 07:15)',
  mdy: 'Month first (11/28/2026 7:15 AM)',
  'unix-s': 'Unix time, seconds',
  'unix-ms': 'Unix time, milliseconds',
};

export type LoggerUnit = 'C' | 'F';

/** Which column holds what, and how to read it: what the baker confirms in the preview. */
export interface LoggerMapping {
  /** Index of the timestamp column. */
  timeColumn: number;
  /** Index of the temperature column. */
  temperatureColumn: number;
  unit: LoggerUnit;
  dateFormat: LoggerDateFormat;
  /** IANA zone for timestamps written without an offset. */
  timeZone: string;
}

/** Where the first guess came from, so the preview can say how sure it is. */
export interface LoggerGuess {
  /** Index of the header row among the first rows (loggers often write a few lines of metadata first). */
  headerRow: number;
  headers: string[];
  mapping: LoggerMapping | null;
  unitFrom: 'header' | 'values';
  /** The header says the times are UTC ("DateTime (UTC)"). */
  zoneFromHeader: boolean;
}

/**
 * A feeding's rise is over within two days even in a cold kitchen; readings later than this after
 * fedAt tell the model nothing about it (common practice: a starter is fed at least daily).
 */
export const LOGGER_WINDOW_HOURS = 48;

/**
 * The model interpolates linearly between readings and a kitchen changes slowly, so one reading
 * per five minutes keeps everything it uses (common practice for room-temperature logging) and
 * keeps 48 h at 577 readings: a single request of TEMPERATURE_READINGS_MAX_PER_REQUEST.
 */
export const LOGGER_THIN_MINUTES = 5;

/** The browser streams the file, so it may be large: a year of minute data is about 15 MB. */
export const LOGGER_FILE_MAX_BYTES = 50 * 1024 * 1024;

/** Problems listed one by one; beyond this only counted. */
export const LOGGER_PROBLEMS_MAX = 50;

export interface LoggerProblem {
  /** 1-based line in the file. */
  line: number;
  message: string;
}
