import { CSV_COLUMNS, REQUIRED_COLUMNS, type CsvColumn, type CsvRow, type ImportRequest } from '@peakwise/shared';
import { fieldError } from '../common/validation.js';
import { unescapeFormula } from './csv-formula-escape.js';

/** Our column → the header of the file to read it from. */
export type ColumnHeaders = Record<CsvColumn, string>;

/**
 * Our column → the header to read it from: the request's mapping where given, else our own name
 * (so an export re-imports without one). Refuses a mapping of columns we do not have.
 */
export function columnHeaders(mapping: ImportRequest['mapping'] = {}): ColumnHeaders {
  // The DTO only checks that the mapping is an object; its keys and values arrive unchecked.
  const entries: Record<string, unknown> = mapping;
  for (const [key, value] of Object.entries(entries)) {
    if (!(CSV_COLUMNS as readonly string[]).includes(key)) {
      throw fieldError(`mapping.${key}`, `Map only our columns: ${CSV_COLUMNS.join(', ')}.`);
    }
    if (typeof value !== 'string' || value === '') throw fieldError(`mapping.${key}`, 'Name a header of the file.');
  }
  return Object.fromEntries(CSV_COLUMNS.map((c) => [c, mapping[c] ?? c])) as ColumnHeaders;
}

/** Refuses a file that lacks a header for a required column, naming the mapping entry if one led there. */
export function requireColumns(fields: string[], headers: ColumnHeaders, mapping: ImportRequest['mapping']): void {
  for (const column of REQUIRED_COLUMNS) {
    if (!fields.includes(headers[column])) {
      throw fieldError(
        mapping?.[column] !== undefined ? `mapping.${column}` : 'csv',
        `The file has no "${headers[column]}" column; map ${column} to one of its headers.`,
      );
    }
  }
}

/**
 * One record of the file by our column names, cells unescaped as the export escaped them (so the
 * preview shows what will be written); a column the file lacks reads as empty.
 */
export function toCsvRow(cells: Record<string, string>, headers: ColumnHeaders): CsvRow {
  return Object.fromEntries(CSV_COLUMNS.map((c) => [c, unescapeFormula(cells[headers[c]] ?? '')])) as CsvRow;
}
