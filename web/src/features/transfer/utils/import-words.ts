import { REQUEST_BODY_MAX_BYTES, type CsvColumn, type ImportError, type ImportResult } from '@peakwise/shared';
import { columnLabel } from './columns';
import type { ColumnMapping } from './csv-header';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
export const feedingsText = (n: number) => plural(n, 'feeding', 'feedings');
export const checksText = (n: number) => plural(n, 'rise check', 'rise checks');

/**
 * "1.5 MB" (binary, as the server counts its limit). Rounded up for a file over the limit, so a
 * file just over 1 MB never reads as "1 MB".
 */
export function sizeText(bytes: number, rounding: 'nearest' | 'up' = 'nearest'): string {
  const round = rounding === 'up' ? Math.ceil : Math.round;
  if (bytes >= 1024 * 1024) return `${round((bytes / (1024 * 1024)) * 10) / 10} MB`;
  return `${Math.max(1, round(bytes / 1024))} KB`;
}

export const SIZE_LIMIT_TEXT = sizeText(REQUEST_BODY_MAX_BYTES);

/** The bytes of the JSON request the CSV travels in: quotes and line breaks grow when escaped. */
export function requestBytes(body: unknown): number {
  return new TextEncoder().encode(JSON.stringify(body)).length;
}

/** The confirm button's words, or null when a checked file holds nothing new. */
export function importLabel(result: ImportResult): string | null {
  const { feedings, riseChecks } = result;
  if (feedings.new > 0) return `Import ${feedingsText(feedings.new)}`;
  if (riseChecks.new > 0) return `Import ${checksText(riseChecks.new)}`;
  return null;
}

/** What a real import wrote, as one sentence. */
export function importedText(result: ImportResult, cultureName: string): string {
  const parts = [feedingsText(result.feedings.new)];
  if (result.riseChecks.new > 0) parts.push(checksText(result.riseChecks.new));
  return `Imported ${parts.join(' and ')} into ${cultureName}.`;
}

/**
 * Where a row error is, in the baker's terms: the line and their own header for the column
 * ("Line 4, column “Jar temp” (Room or jar temperature (°C))"), so they can find it in a spreadsheet.
 */
export function errorPlace(error: ImportError, mapping: ColumnMapping): string {
  const header = mapping[error.field as CsvColumn];
  if (header) return `Line ${error.line}, column “${header}” (${columnLabel(error.field)})`;
  if (error.field === 'row' || error.field === 'file') return `Line ${error.line}`;
  return `Line ${error.line}, ${columnLabel(error.field)}`;
}

/** The API's refusal of a real import names rows as "line N: column"; back to ImportErrors. */
export function errorsFromDetails(details: readonly { field: string; message: string }[]): ImportError[] {
  const errors: ImportError[] = [];
  for (const { field, message } of details) {
    const match = /^line (\d+): (.+)$/.exec(field);
    if (match) errors.push({ line: Number(match[1]), field: match[2]!, message });
  }
  return errors;
}
