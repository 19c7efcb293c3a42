import { describe, expect, it } from 'vitest';
import { guessLoggerMapping } from './columns.js';
import { LoggerCollector, batches } from './readings.js';
import { readSample } from './test-files.js';
import type { LoggerMapping } from './types.js';

const HOUR = 3_600_000;
const at = (iso: string) => Date.parse(iso);
const NOW = at('2026-12-02T00:00:00Z');

function collect(name: string, fedAt: string, timeZone = 'UTC') {
  const rows = readSample(name);
  const guess = guessLoggerMapping(rows.slice(0, 200), timeZone);
  if (!guess.mapping) throw new Error('no mapping');
  const collector = new LoggerCollector(guess.mapping, { startMs: at(fedAt), nowMs: NOW });
  rows.slice(guess.headerRow + 1).forEach((cells, i) => collector.add(cells, guess.headerRow + 2 + i));
  return collector.result();
}

describe('LoggerCollector', () => {
  it('converts °F to °C by the standard definition t/°C = (t/°F − 32)/1.8 (NIST SP 811, B.9)', () => {
    const mapping: LoggerMapping = {
      timeColumn: 0,
      temperatureColumn: 1,
      unit: 'F',
      dateFormat: 'iso',
      timeZone: 'UTC',
    };
    const c = new LoggerCollector(mapping, { startMs: at('2026-11-28T07:00:00Z'), nowMs: NOW });
    c.add(['2026-11-28 07:10', '98.6'], 2);
    c.add(['2026-11-28 07:20', '32'], 3);
    c.add(['2026-11-28 07:30', '-4'], 4);
    // 98.6 °F = 37 °C, 32 °F = 0 °C, −4 °F = −20 °C (below the logger range, so left out).
    expect(c.result().readings.map((r) => r.c)).toEqual([37, 0]);
    const problems = c.result().problems;
    expect(problems.map((p) => p.line)).toEqual([4]);
    expect(problems[0]?.message).toContain('-4 °F');
  });

  it('keeps fedAt … fedAt + 48 h of a minute-by-minute file, one reading per 5 minutes, and counts the rest', () => {
    // Sample: 36 h of readings from 06:00 (UTC here); fed at 12:00, so the first 6 h are before the feeding.
    const result = collect('kitchen-fahrenheit-mdy.csv', '2026-11-28T12:00:00Z');
    expect(result.rows).toBe(36 * 60);
    expect(result.outside).toBe(6 * 60);
    expect(result.readings).toHaveLength(30 * 12);
    expect(result.thinned).toBe(30 * 60 - 30 * 12);
    expect(result.readings[0]?.ms).toBe(at('2026-11-28T12:00:00Z'));
    expect(result.readings.every((r, i, all) => i === 0 || r.ms - (all[i - 1]?.ms ?? 0) >= 5 * 60_000)).toBe(true);
    // 80 °F ± 1.5 °F is 26.7 °C ± 0.8 °C.
    expect(result.readings.every((r) => r.c > 25.8 && r.c < 27.6)).toBe(true);
    expect(result.problemCount).toBe(0);
  });

  it('ends the window at 48 h after fedAt', () => {
    const result = collect('day-first-fahrenheit.csv', '2026-11-28T07:15:00Z');
    // Every 6 h from the feeding: 0, 6, …, 30 h are all inside 48 h.
    expect(result.readings).toHaveLength(6);
    const late = collect('day-first-fahrenheit.csv', '2026-11-26T13:00:00Z');
    // 48 h after 26 Nov 13:00 is 28 Nov 13:00: only 07:15 is inside.
    expect(late.readings).toHaveLength(1);
    expect(late.outside).toBe(5);
  });

  it('names unreadable rows by their line in the file', () => {
    const result = collect('cellar-celsius-utc.csv', '2026-11-28T07:00:00Z');
    expect(result.problems).toEqual([
      { line: 6, message: 'No temperature in this row.' },
      { line: 9, message: '“ERR” is not a number.' },
    ]);
    expect(result.readings).toHaveLength(10);
  });

  it('reads decimal commas in a semicolon file of Unix seconds', () => {
    const result = collect('unix-seconds-decimal-comma.csv', '2026-11-28T07:00:00Z');
    // One a minute from fedAt: minutes 0–4 keep the first (21,5), minutes 5–7 the sixth (22,0).
    expect(result.readings.map((r) => r.c)).toEqual([21.5, 22]);
    expect(result.thinned).toBe(6);
  });

  it('leaves out readings in the future', () => {
    const mapping: LoggerMapping = {
      timeColumn: 0,
      temperatureColumn: 1,
      unit: 'C',
      dateFormat: 'iso',
      timeZone: 'UTC',
    };
    const c = new LoggerCollector(mapping, { startMs: NOW - HOUR, nowMs: NOW });
    c.add(['2026-12-01 23:30', '20'], 2);
    c.add(['2026-12-02 00:30', '20'], 3);
    expect(c.result()).toMatchObject({ outside: 1, readings: [{ c: 20 }] });
  });
});

describe('batches', () => {
  it('splits into request-sized pieces', () => {
    expect(batches([1, 2, 3, 4, 5], 2)).toEqual([[1, 2], [3, 4], [5]]);
    expect(batches([], 2)).toEqual([]);
  });
});
