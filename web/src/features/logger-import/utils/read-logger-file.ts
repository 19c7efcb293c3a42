import { LoggerCollector, type LoggerCollection, type LoggerMapping, type LoggerWindow } from '@peakwise/shared';
import Papa from 'papaparse';

// papaparse reads the File in chunks, so a year of minute data (≈ 500k rows) never sits in memory
// as one string; only the feeding's window of readings is kept (LoggerCollector).

/** Rows read for the preview and the first guess at the mapping. */
export const PREVIEW_ROWS = 200;

export interface NumberedRow {
  /** 1-based line in the file. */
  line: number;
  cells: string[];
}

/** A row of nothing but separators and spaces, as a spreadsheet leaves at the end. */
const blank = (cells: readonly string[]) => cells.every((c) => c.trim() === '');

/** The first PREVIEW_ROWS lines of the file; blank rows left out, each kept row with its line. */
export function readFirstRows(file: File): Promise<NumberedRow[]> {
  return new Promise((resolve, reject) => {
    Papa.parse<string[]>(file, {
      preview: PREVIEW_ROWS,
      skipEmptyLines: false,
      complete: (results) =>
        resolve(results.data.map((cells, i) => ({ line: i + 1, cells })).filter((row) => !blank(row.cells))),
      error: (error) => reject(error),
    });
  });
}

/**
 * Every row after the header through the collector. Lines are counted as papaparse hands rows
 * over, blank lines included, so a problem's line matches what a text editor shows (a quoted cell
 * holding a line break would shift them; loggers do not write those).
 */
export function collectReadings(
  file: File,
  headerRow: number,
  mapping: LoggerMapping,
  window: LoggerWindow,
): Promise<LoggerCollection> {
  const collector = new LoggerCollector(mapping, window);
  let line = 0;
  let dataRowsSeen = 0;
  return new Promise((resolve, reject) => {
    Papa.parse<string[]>(file, {
      skipEmptyLines: false,
      step: (results) => {
        line++;
        const cells = results.data;
        if (blank(cells)) return;
        // headerRow counts non-blank rows, as readFirstRows keeps them.
        if (dataRowsSeen++ <= headerRow) return;
        collector.add(cells, line);
      },
      complete: () => resolve(collector.result()),
      error: (error) => reject(error),
    });
  });
}
