import { TEMPERATURE_MAX_C, TEMPERATURE_MIN_C } from '../contracts/culture.js';
import { fahrenheitToCelsius } from '../units.js';
import { parseLoggerNumber } from './columns.js';
import { parseLoggerTime } from './dates.js';
import {
  LOGGER_DATE_FORMAT_LABELS,
  LOGGER_PROBLEMS_MAX,
  LOGGER_THIN_MINUTES,
  LOGGER_WINDOW_HOURS,
  type LoggerMapping,
  type LoggerProblem,
} from './types.js';

// The rows of a file, one at a time (papaparse's `step` in the browser), into the readings of one
// feeding or bake: only those inside its window (a feeding: fedAt to fedAt + LOGGER_WINDOW_HOURS;
// never after `now`), in °C, at most one per LOGGER_THIN_MINUTES. Memory stays at the window's size however long the file is.

export interface LoggerReading {
  /** ms since the epoch. */
  ms: number;
  /** °C. */
  c: number;
}

export interface LoggerCollection {
  /** Sorted by time, thinned; what is sent. */
  readings: LoggerReading[];
  /** Rows read (after the header), blank rows not counted. */
  rows: number;
  /** Readable rows outside the window (or in the future). */
  outside: number;
  /** Readable rows inside the window dropped because a kept reading was closer than LOGGER_THIN_MINUTES. */
  thinned: number;
  /** Rows that could not be read, line-numbered; at most LOGGER_PROBLEMS_MAX listed. */
  problems: LoggerProblem[];
  problemCount: number;
}

/** The stretch of time readings are kept from: a feeding's 48 h, or a bake's run. */
export interface LoggerWindow {
  /** The feeding's time, or the start of a bake's window. */
  startMs: number;
  /** Default LOGGER_WINDOW_HOURS (a feeding's). */
  hours?: number;
  /** The server's clock is the judge; the browser's is close enough to leave out the future. */
  nowMs: number;
}

export class LoggerCollector {
  private readonly byBucket = new Map<number, LoggerReading>();
  private readonly endMs: number;
  private rows = 0;
  private outside = 0;
  private inside = 0;
  private problemCount = 0;
  private readonly problems: LoggerProblem[] = [];

  constructor(
    private readonly mapping: LoggerMapping,
    private readonly window: LoggerWindow,
  ) {
    this.endMs = Math.min(window.startMs + (window.hours ?? LOGGER_WINDOW_HOURS) * 3_600_000, window.nowMs);
  }

  private problem(line: number, message: string): void {
    this.problemCount++;
    if (this.problems.length < LOGGER_PROBLEMS_MAX) this.problems.push({ line, message });
  }

  /** One data row; `line` is its 1-based line in the file. */
  add(cells: readonly string[], line: number): void {
    if (cells.every((c) => c.trim() === '')) return;
    this.rows++;
    const timeCell = cells[this.mapping.timeColumn] ?? '';
    const ms = parseLoggerTime(timeCell, this.mapping.dateFormat, this.mapping.timeZone);
    if (ms === null) {
      const form = LOGGER_DATE_FORMAT_LABELS[this.mapping.dateFormat];
      this.problem(
        line,
        timeCell.trim() === '' ? 'No time in this row.' : `“${timeCell.trim()}” is not a time in the form ${form}.`,
      );
      return;
    }
    const tempCell = cells[this.mapping.temperatureColumn] ?? '';
    const value = parseLoggerNumber(tempCell);
    if (value === null) {
      this.problem(
        line,
        tempCell.trim() === '' ? 'No temperature in this row.' : `“${tempCell.trim()}” is not a number.`,
      );
      return;
    }
    if (ms < this.window.startMs || ms > this.endMs) {
      this.outside++;
      return;
    }
    const c = this.mapping.unit === 'F' ? fahrenheitToCelsius(value) : value;
    if (c < TEMPERATURE_MIN_C || c > TEMPERATURE_MAX_C) {
      const unit = this.mapping.unit === 'F' ? '°F' : '°C';
      this.problem(
        line,
        `${value} ${unit} is outside what a kitchen logger reads (${TEMPERATURE_MIN_C} to ${TEMPERATURE_MAX_C} °C); left out.`,
      );
      return;
    }
    this.inside++;
    // Buckets counted from the window's start, so the feeding's own time is a bucket edge; the earliest row of
    // each bucket is kept, whatever order the file lists them in.
    const bucket = Math.floor((ms - this.window.startMs) / (LOGGER_THIN_MINUTES * 60_000));
    const kept = this.byBucket.get(bucket);
    if (!kept || ms < kept.ms) this.byBucket.set(bucket, { ms, c: Math.round(c * 100) / 100 });
  }

  result(): LoggerCollection {
    const readings = [...this.byBucket.values()].sort((a, b) => a.ms - b.ms);
    return {
      readings,
      rows: this.rows,
      outside: this.outside,
      thinned: this.inside - readings.length,
      problems: [...this.problems],
      problemCount: this.problemCount,
    };
  }
}

/** Readings split into request-sized batches. */
export function batches<T>(items: readonly T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}
