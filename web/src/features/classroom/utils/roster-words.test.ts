import type { RosterRow } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { flagList, hoursText, riseText, rosterSummary, sortedFlags } from './roster-words';

const row = (over: Partial<RosterRow>): RosterRow => ({
  studentId: 's',
  studentName: 'Someone',
  cultureId: 'c',
  cultureName: 'Jar',
  lastFedAt: null,
  hoursSinceFed: null,
  hoursToPeakAtReference: null,
  riseMultiple: null,
  trend: null,
  flags: [],
  ...over,
});

describe('the roster summary above the table', () => {
  it('names the struggling culture and its student', () => {
    const summary = rosterSummary([
      row({ studentId: 't', studentName: 'Theo Park', cultureId: 'b', cultureName: 'Bramble' }),
      row({ studentId: 'd', studentName: 'Dev Rowan', cultureId: 'p', cultureName: 'Pip', flags: ['sluggish'] }),
    ]);
    expect(summary.headline).toBe('1 culture needs a look');
    expect(summary.lines).toEqual([{ key: 'd:p', cultureId: 'p', name: 'Pip (Dev Rowan)', flags: ['sluggish'] }]);
  });

  it('puts a caution before a sluggish culture, and a sluggish one before a missing rise check', () => {
    const summary = rosterSummary([
      row({ studentId: 'a', cultureId: 'a', flags: ['no-rise-checks'] }),
      row({ studentId: 'b', cultureId: 'b', flags: ['overdue', 'sluggish'] }),
      row({ studentId: 'c', cultureId: 'c', flags: ['caution'] }),
      row({ studentId: 'n', studentName: 'New Student', cultureId: null, cultureName: null, flags: ['no-culture'] }),
    ]);
    expect(summary.headline).toBe('4 need a look');
    expect(summary.lines.map((l) => l.key)).toEqual(['c:c', 'b:b', 'a:a', 'n:']);
    expect(summary.lines[1]!.flags).toEqual(['sluggish', 'overdue']);
    expect(summary.lines[3]!.name).toBe('New Student');
  });

  it('says so when all is well, or when nothing is logged yet', () => {
    expect(rosterSummary([row({})]).headline).toBe('Every culture looks fine');
    expect(rosterSummary([]).headline).toBe('No cultures logged yet');
  });
});

describe('roster cells', () => {
  it('lists flags most urgent first in plain words', () => {
    expect(sortedFlags(['no-rise-checks', 'caution'])).toEqual(['caution', 'no-rise-checks']);
    expect(flagList(['no-rise-checks', 'sluggish'])).toBe('sluggish, no rise checks');
  });

  it('shows hours and rise with their units, a dash when unknown', () => {
    expect(hoursText(5.24)).toBe('5.2 h');
    expect(hoursText(null)).toBe('—');
    expect(riseText(2.25)).toBe('2.3 ×');
    expect(riseText(null)).toBe('—');
  });
});
