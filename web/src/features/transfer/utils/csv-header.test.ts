import { CSV_COLUMNS } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { mappingForRequest, normalizeHeader, readHeaders, sameHeaders, suggestMapping } from './csv-header';

describe('reading the header row', () => {
  it('reads our own export header as our columns', () => {
    const csv = `${CSV_COLUMNS.join(',')}\r\n2025-02-01T07:30:00.000Z,20,100,90.5,,,,,,,,,\r\n`;
    expect(readHeaders(csv)).toEqual([...CSV_COLUMNS]);
  });

  it('honours quotes holding separators, doubled quotes and line breaks, and trims names', () => {
    const csv = '\uFEFF\r\n  When , "Flour, g","The ""jar""\nheight",Notes\n1,2,3,4';
    expect(readHeaders(csv)).toEqual(['When', 'Flour, g', 'The "jar"\nheight', 'Notes']);
  });

  it('finds the separator a spreadsheet used (semicolon, tab)', () => {
    expect(readHeaders('Fed at;Starter (g);Notes, free text\n')).toEqual(['Fed at', 'Starter (g)', 'Notes, free text']);
    expect(readHeaders('fed_at\tstarter_g\n')).toEqual(['fed_at', 'starter_g']);
  });

  it('finds no header in an empty file', () => {
    expect(readHeaders('')).toEqual([]);
    expect(readHeaders('\r\n\r\n')).toEqual([]);
  });
});

describe('matching the file’s headers to our columns', () => {
  it('ignores case, spaces, underscores and brackets', () => {
    expect(normalizeHeader('Starter (g)')).toBe(normalizeHeader('starter_g'));
    expect(normalizeHeader(' FED AT ')).toBe(normalizeHeader('fed_at'));
    expect(normalizeHeader('Flour')).not.toBe(normalizeHeader('flour_g'));
  });

  it('preselects same-named columns and leaves the rest for the baker', () => {
    const mapping = suggestMapping(['Fed At', 'Starter (g)', 'FLOUR_G', 'water g', 'Jar temp', 'Flour', 'Checked']);
    expect(mapping).toMatchObject({
      fed_at: 'Fed At',
      starter_g: 'Starter (g)',
      flour_g: 'FLOUR_G',
      water_g: 'water g',
      flour: 'Flour',
      temperature_c: '',
      check_taken_at: '',
    });
    expect(Object.keys(mapping)).toEqual([...CSV_COLUMNS]);
  });

  it('takes the first of two headers with the same name', () => {
    expect(suggestMapping(['notes', 'Notes']).notes).toBe('notes');
  });

  it('sends only the columns pointed at a header', () => {
    const mapping = { ...suggestMapping(['When', 'notes']), fed_at: 'When' };
    expect(mappingForRequest(mapping)).toEqual({ fed_at: 'When', notes: 'notes' });
  });

  it('knows a corrected copy of the same file by its headers', () => {
    expect(sameHeaders(['a', 'b'], ['a', 'b'])).toBe(true);
    expect(sameHeaders(['a', 'b'], ['a', 'c'])).toBe(false);
    expect(sameHeaders(['a'], ['a', 'b'])).toBe(false);
  });
});
