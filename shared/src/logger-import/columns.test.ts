import { describe, expect, it } from 'vitest';
import { guessLoggerMapping, headerWords, unitFromHeader, unitFromValues, parseLoggerNumber } from './columns.js';
import { readSample } from './test-files.js';

// The sample files are invented (test-fixtures/logger/README.md).

describe('header spellings', () => {
  it('reduces headers to lower-case words', () => {
    expect(headerWords('Temp (°F)')).toBe('temp f');
    expect(headerWords('DateTime (UTC)')).toBe('date time utc');
    expect(headerWords('Temperature_C')).toBe('temperature c');
  });

  it('reads the unit a header names, and none when it names none', () => {
    expect(['Temp (°F)', '°F', 'Fahrenheit', 'temp_f', 'Temperature [degF]'].map(unitFromHeader)).toEqual(
      Array(5).fill('F'),
    );
    expect(['Temperature_C', 'Celsius', '°C', 'Temp (C)'].map(unitFromHeader)).toEqual(Array(4).fill('C'));
    expect(['Temp', 'Reading', 'Timestamp'].map(unitFromHeader)).toEqual([null, null, null]);
  });

  it('guesses the unit from values when the header is silent: a kitchen above 45 is °F', () => {
    expect(unitFromValues([68, 70.5, 72])).toBe('F');
    expect(unitFromValues([19.5, 21, 24])).toBe('C');
    expect(unitFromValues([])).toBe('C');
  });

  it('reads decimal points and decimal commas, nothing else', () => {
    expect(parseLoggerNumber(' 21,5 ')).toBe(21.5);
    expect(parseLoggerNumber('-3.25')).toBe(-3.25);
    expect(parseLoggerNumber('ERR')).toBeNull();
    expect(parseLoggerNumber('')).toBeNull();
  });
});

describe('guessLoggerMapping on the sample files', () => {
  it('skips metadata lines and reads "Date Time" / "Temp (°F)" as month-first °F in the account zone', () => {
    const guess = guessLoggerMapping(readSample('kitchen-fahrenheit-mdy.csv').slice(0, 200), 'Europe/Berlin');
    expect(guess.headerRow).toBe(2);
    expect(guess.mapping).toEqual({
      timeColumn: 0,
      temperatureColumn: 1,
      unit: 'F',
      dateFormat: 'mdy',
      timeZone: 'Europe/Berlin',
    });
    expect(guess.unitFrom).toBe('header');
  });

  it('takes UTC from a "DateTime (UTC)" header and ignores the humidity column', () => {
    const guess = guessLoggerMapping(readSample('cellar-celsius-utc.csv'), 'America/Chicago');
    expect(guess.mapping).toEqual({
      timeColumn: 0,
      temperatureColumn: 1,
      unit: 'C',
      dateFormat: 'iso',
      timeZone: 'UTC',
    });
    expect(guess.zoneFromHeader).toBe(true);
  });

  it('reads Unix seconds under "Timestamp" and "Celsius"', () => {
    const guess = guessLoggerMapping(readSample('unix-seconds-decimal-comma.csv'), 'UTC');
    expect(guess.mapping).toMatchObject({ timeColumn: 0, temperatureColumn: 1, unit: 'C', dateFormat: 'unix-s' });
  });

  it('reads "Time" / "°F" with day-first dates', () => {
    const guess = guessLoggerMapping(readSample('day-first-fahrenheit.csv'), 'UTC');
    expect(guess.mapping).toMatchObject({ timeColumn: 0, temperatureColumn: 1, unit: 'F', dateFormat: 'dmy' });
  });

  it('finds the columns by their values when the headers say nothing, and the unit from the values', () => {
    const rows = [
      ['Reading', 'When'],
      ['70.1', '2026-11-28 07:15'],
      ['70.4', '2026-11-28 07:20'],
    ];
    const guess = guessLoggerMapping(rows, 'UTC');
    expect(guess.mapping).toMatchObject({ timeColumn: 1, temperatureColumn: 0, unit: 'F' });
    expect(guess.unitFrom).toBe('values');
  });

  it('gives no mapping when no column holds times', () => {
    expect(guessLoggerMapping([['Temp'], ['21']], 'UTC').mapping).toBeNull();
  });
});
