import { detectDateFormat } from './dates.js';
import type { LoggerGuess, LoggerUnit } from './types.js';

// Which column is the time and which the temperature, from the header's spelling first and the
// values second. Loggers disagree on names ("Timestamp", "Date Time", "DateTime (UTC)", "Temp (°F)",
// "Temperature_C", "Celsius", "°F"), so names are compared as lower-case words.

/** "Temp (°F)" → "temp f"; "DateTime (UTC)" → "datetime utc"; "Temperature_C" → "temperature c". */
export function headerWords(header: string): string {
  return header
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase()
    .replace(/°/g, ' ')
    .replace(/[^a-z0-9]+/g, ' ')
    .trim();
}

const TIME_WORDS = /\b(timestamp|date ?time|date|time|datum|zeit|epoch|unix|utc|recorded|logged)\b/;
const TEMPERATURE_WORDS = /\b(temp|temperature|temperatur|celsius|fahrenheit|degc|degf|deg c|deg f|c|f)\b/;

export function looksLikeTime(header: string): boolean {
  const words = headerWords(header);
  return TIME_WORDS.test(words) && !/\btemp/.test(words);
}

export function looksLikeTemperature(header: string): boolean {
  return TEMPERATURE_WORDS.test(headerWords(header));
}

/** The unit a header names, or null when it names none ("Temp", "Reading"). */
export function unitFromHeader(header: string): LoggerUnit | null {
  const words = headerWords(header);
  if (/\b(f|degf|deg f|fahrenheit)\b/.test(words) || /°\s*F/i.test(header)) return 'F';
  if (/\b(c|degc|deg c|celsius)\b/.test(words) || /°\s*C/i.test(header)) return 'C';
  return null;
}

/** A number as loggers write it: "21.5", "21,5" (decimal comma), " 70.1 ". */
export function parseLoggerNumber(cell: string): number | null {
  const s = cell.trim().replace(/^(-?\d+),(\d+)$/, '$1.$2');
  if (!/^-?\d+(?:\.\d+)?$/.test(s)) return null;
  return Number(s);
}

/**
 * Without a unit in the header, the values decide: a kitchen is 15–30 °C, which is 59–86 °F, so a
 * middle value above 45 is Fahrenheit (45 °C would spoil a starter; 45 °F is a cool cellar).
 */
export function unitFromValues(values: readonly number[]): LoggerUnit {
  if (values.length === 0) return 'C';
  const sorted = [...values].sort((a, b) => a - b);
  return (sorted[Math.floor(sorted.length / 2)] ?? 0) > 45 ? 'F' : 'C';
}

function columnCells(rows: readonly string[][], column: number): string[] {
  return rows.map((r) => r[column] ?? '').filter((c) => c.trim() !== '');
}

/** The header row: the first of the early rows with both a time-like and a temperature-like name. */
export function findHeaderRow(rows: readonly string[][]): number {
  const limit = Math.min(rows.length, 20);
  for (let i = 0; i < limit; i++) {
    const row = rows[i] ?? [];
    if (row.some(looksLikeTime) && row.some(looksLikeTemperature)) return i;
  }
  return 0;
}

/**
 * The first guess at the mapping from the first rows of the file (header included). `timeZone` is
 * the account's zone, used unless the time header says UTC. `mapping` is null when no column reads
 * as times or none as numbers; the baker then chooses.
 */
export function guessLoggerMapping(rows: readonly string[][], timeZone: string): LoggerGuess {
  const headerRow = findHeaderRow(rows);
  const headers = (rows[headerRow] ?? []).map((h) => h.trim());
  const body = rows.slice(headerRow + 1);
  const columns = headers.map((_, i) => i);
  const h = (i: number): string => headers[i] ?? '';

  const dateFormatOf = (i: number) => detectDateFormat(columnCells(body, i).slice(0, 50));
  // Most, not all: loggers write "ERR" or nothing for a missed reading, which the import then names.
  const numeric = (i: number) => {
    const cells = columnCells(body, i).slice(0, 50);
    return cells.length > 0 && cells.filter((c) => parseLoggerNumber(c) !== null).length >= 0.8 * cells.length;
  };
  const timeColumn =
    columns.find((i) => looksLikeTime(h(i)) && dateFormatOf(i) !== null) ??
    columns.find((i) => dateFormatOf(i) !== null && !looksLikeTemperature(h(i)));
  // "Temp (°F)" before "Dew point (°F)": a name that says temperature beats one that only names a unit.
  const temperatureColumn =
    columns.find((i) => i !== timeColumn && /\b(temp|celsius|fahrenheit)/.test(headerWords(h(i))) && numeric(i)) ??
    columns.find((i) => i !== timeColumn && looksLikeTemperature(h(i)) && numeric(i)) ??
    columns.find((i) => i !== timeColumn && numeric(i) && !looksLikeTime(h(i)));

  const zoneFromHeader = timeColumn !== undefined && /\b(utc|gmt)\b/.test(headerWords(h(timeColumn)));
  if (timeColumn === undefined || temperatureColumn === undefined) {
    return { headerRow, headers, mapping: null, unitFrom: 'values', zoneFromHeader: false };
  }
  const named = unitFromHeader(h(temperatureColumn));
  const values = columnCells(body, temperatureColumn)
    .map(parseLoggerNumber)
    .filter((v): v is number => v !== null);
  return {
    headerRow,
    headers,
    mapping: {
      timeColumn,
      temperatureColumn,
      unit: named ?? unitFromValues(values),
      dateFormat: dateFormatOf(timeColumn) ?? 'iso',
      timeZone: zoneFromHeader ? 'UTC' : timeZone,
    },
    unitFrom: named ? 'header' : 'values',
    zoneFromHeader,
  };
}
