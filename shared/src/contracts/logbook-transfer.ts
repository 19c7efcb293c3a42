import type { Account } from './account.js';
import type { Culture, Feeding, RiseCheck, TemperatureReading } from './culture.js';

// Import and export of the culture logbook: a culture's feedings as CSV (out and back in) and the
// whole account as JSON.

/**
 * The columns of a culture's feeding CSV, in file order: one row per rise check, the feeding's
 * columns repeated; a feeding without checks has one row with the check columns empty. Export
 * writes these headers and import reads them by default, so an export re-imports as it is.
 */
export const CSV_COLUMNS = [
  'fed_at',
  'starter_g',
  'flour_g',
  'water_g',
  'flour',
  'temperature_c',
  'water_temperature_c',
  'initial_height_mm',
  'observations',
  'notes',
  'check_taken_at',
  'check_height_mm',
  'check_temperature_c',
] as const;

export type CsvColumn = (typeof CSV_COLUMNS)[number];

/** Columns every file must have a header for (by our name or through the mapping). */
export const REQUIRED_COLUMNS: readonly CsvColumn[] = ['fed_at', 'starter_g', 'flour_g', 'water_g'];

/** The check columns; all empty means the row is a feeding without a check. */
export const CHECK_COLUMNS: readonly CsvColumn[] = ['check_taken_at', 'check_height_mm', 'check_temperature_c'];

/** Observations are one cell, separated by this. */
export const OBSERVATION_SEPARATOR = ';';

/** One row of the file, by our column names. */
export type CsvRow = Record<CsvColumn, string>;

/** Limits of one import. */
export const IMPORT_MAX_ROWS = 5000;
/** The API's request body limit (the CSV travels as JSON text, so the file must be a little smaller). */
export const REQUEST_BODY_MAX_BYTES = 1024 * 1024;
export const PREVIEW_ROWS = 10;

/** POST /api/cultures/:id/import */
export interface ImportRequest {
  /** The CSV file as text, with a header row. */
  csv: string;
  /** Our column → the header in this file, for columns named differently. */
  mapping?: Partial<Record<CsvColumn, string>>;
  /** true: check and count only, write nothing. */
  dryRun?: boolean;
}

export interface ImportError {
  /** Line in the file, 1-based, the header being line 1. */
  line: number;
  /** Our column name (or "file" for the file as a whole). */
  field: string;
  message: string;
}

export interface ImportResult {
  dryRun: boolean;
  feedings: { new: number; duplicate: number };
  riseChecks: { new: number; duplicate: number };
  errors: ImportError[];
  /** The first PREVIEW_ROWS rows, by our column names. */
  preview: CsvRow[];
}

/** GET /api/account/export.json */
export interface AccountExport {
  format: 'peakwise-export';
  version: 1;
  exportedAt: string;
  account: Account;
  cultures: Culture[];
  feedings: Feeding[];
  riseChecks: RiseCheck[];
  temperatureReadings: TemperatureReading[];
}
