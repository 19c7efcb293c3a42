import type { LoggerCollection } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { addedText, checkedText, fileSizeText } from './logger-words';

const collection = (over: Partial<LoggerCollection>): LoggerCollection => ({
  readings: [],
  rows: 0,
  outside: 0,
  thinned: 0,
  problems: [],
  problemCount: 0,
  ...over,
});

describe('logger import words', () => {
  it('says what was added and what was left out', () => {
    expect(addedText(412, 37)).toBe('412 readings added; 37 outside this feeding’s time left out.');
    expect(addedText(1, 0)).toBe('1 reading added.');
    expect(addedText(1200, 525600)).toBe('1,200 readings added; 525,600 outside this feeding’s time left out.');
  });

  it('lists only the reasons that apply', () => {
    const readings = Array.from({ length: 3 }, (_, i) => ({ ms: i, c: 20 }));
    expect(checkedText(collection({ readings, rows: 3 }), 0)).toEqual(['3 readings to add, from 3 rows read.']);
    const lines = checkedText(collection({ readings, rows: 20, outside: 5, thinned: 12 }), 1);
    expect(lines[0]).toBe('2 readings to add, from 20 rows read.');
    expect(lines.slice(1).map((l) => l.split(' ')[0])).toEqual(['5', '12', '1']);
  });

  it('names the bake’s window for a bake', () => {
    const readings = [{ ms: 0, c: 20 }];
    const lines = checkedText(collection({ readings, rows: 9, outside: 8 }), 1, 'bake');
    expect(lines[1]).toBe(
      '8 readings outside this bake’s time (from an hour before the mix to the bread being ready) left out.',
    );
    expect(lines[2]).toBe('1 reading already on this bake left as it is.');
    expect(addedText(3, 2, 'bake')).toBe('3 readings added; 2 outside this bake’s time left out.');
  });

  it('writes file sizes in KB and MB', () => {
    expect(fileSizeText(48 * 1024)).toBe('48 KB');
    expect(fileSizeText(15.3 * 1024 * 1024)).toBe('15.3 MB');
  });
});
