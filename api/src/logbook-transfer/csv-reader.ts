import { IMPORT_MAX_ROWS, type ImportError } from '@peakwise/shared';
import Papa from 'papaparse';

/** One record of the file by its own headers, with the file line on which it starts. */
export interface ParsedRow {
  line: number;
  cells: Record<string, string>;
}

export interface ParsedCsv {
  /** The file's headers, trimmed. */
  fields: string[];
  /** At most IMPORT_MAX_ROWS + 1 rows: one more than allowed tells the caller the file is too long. */
  rows: ParsedRow[];
  /** Rows whose shape is wrong (cell count, unclosed quotes): the file's problems, not a column's. */
  errors: ImportError[];
}

/** Parses a CSV with a header row, noting the file line on which each record starts. */
export function parseCsv(csv: string): ParsedCsv {
  const rows: ParsedRow[] = [];
  const errors: ImportError[] = [];
  let fields: string[] | undefined;
  // Papa reports a byte cursor, not a line: count the newlines passed so far, so that a quoted
  // cell spanning lines still gives the line a baker sees in an editor.
  let start = 0;
  let line = 1;
  const advance = (to: number) => {
    for (let i = start; i < to; i++) if (csv[i] === '\n') line++;
    start = Math.max(start, to);
  };
  Papa.parse<string[]>(csv, {
    skipEmptyLines: true,
    step: (result, parser) => {
      let i = start;
      while (csv[i] === '\r' || csv[i] === '\n') i++;
      advance(i);
      const rowLine = line;
      advance(result.meta.cursor);
      if (!fields) {
        fields = result.data.map((field) => field.trim());
        return;
      }
      if (rows.length >= IMPORT_MAX_ROWS) {
        rows.push({ line: rowLine, cells: {} });
        parser.abort();
        return;
      }
      const cells = Object.fromEntries(fields.map((field, index) => [field, result.data[index] ?? '']));
      rows.push({ line: rowLine, cells });
      if (result.data.length !== fields.length) {
        const message = `This row has ${result.data.length} cells; the header has ${fields.length}.`;
        errors.push({ line: rowLine, field: 'row', message });
      }
      for (const problem of result.errors) errors.push({ line: rowLine, field: 'row', message: problem.message });
    },
  });
  return { fields: fields ?? [], rows, errors };
}
