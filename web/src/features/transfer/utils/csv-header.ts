import { CSV_COLUMNS, type CsvColumn } from '@peakwise/shared';

// The server parses the whole file (papaparse); the browser only needs the header row to offer a
// mapping, so a small reader of the first record is enough and keeps papaparse out of the bundle.

/** The separators a spreadsheet is likely to have used; the server's parser guesses among these too. */
const DELIMITERS = [',', ';', '\t', '|'] as const;

/** Splits one record from the start of `text`, honouring quotes (which may hold separators and line breaks). */
function firstRecord(text: string, delimiter: string): string[] {
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (ch === '"') {
        quoted = false;
      } else {
        cell += ch;
      }
    } else if (ch === '"' && cell.trim() === '') {
      quoted = true;
      cell = '';
    } else if (ch === delimiter) {
      cells.push(cell);
      cell = '';
    } else if (ch === '\n' || ch === '\r') {
      break;
    } else {
      cell += ch;
    }
  }
  cells.push(cell);
  return cells;
}

/**
 * The file's header row: the first non-empty line, split by whichever separator gives the most
 * columns, each name trimmed (as the server trims them). Empty when the file has no header.
 */
export function readHeaders(csv: string): string[] {
  const text = csv.replace(/^\uFEFF/, '').replace(/^[\r\n]+/, '');
  if (text.trim() === '') return [];
  let best: string[] = [];
  for (const delimiter of DELIMITERS) {
    const cells = firstRecord(text, delimiter);
    if (cells.length > best.length) best = cells;
  }
  return best.map((cell) => cell.trim());
}

/** "Starter (g)", "starter_g" and "STARTER G" are the same name: letters and digits only, lower case. */
export function normalizeHeader(name: string): string {
  return name.toLowerCase().replace(/[^a-z0-9]/g, '');
}

/** Our column → the file's header, '' when the file has none for it. */
export type ColumnMapping = Record<CsvColumn, string>;

/** Preselects each of our columns whose name the file spells the same, ignoring case, spaces and marks. */
export function suggestMapping(headers: readonly string[]): ColumnMapping {
  const byName = new Map<string, string>();
  for (const header of headers) {
    const key = normalizeHeader(header);
    // The first of two same-named headers wins, as it would for a person reading left to right.
    if (key && !byName.has(key)) byName.set(key, header);
  }
  return Object.fromEntries(CSV_COLUMNS.map((c) => [c, byName.get(normalizeHeader(c)) ?? ''])) as ColumnMapping;
}

/** The mapping as the API takes it: only columns the baker pointed at a header. */
export function mappingForRequest(mapping: ColumnMapping): Partial<Record<CsvColumn, string>> {
  return Object.fromEntries(Object.entries(mapping).filter(([, header]) => header !== ''));
}

/** Whether two header rows are the same, so a corrected file can keep the baker's mapping. */
export function sameHeaders(a: readonly string[], b: readonly string[]): boolean {
  return a.length === b.length && a.every((header, i) => header === b[i]);
}
