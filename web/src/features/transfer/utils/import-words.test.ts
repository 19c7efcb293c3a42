import type { ImportResult } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { suggestMapping } from './csv-header';
import { errorPlace, errorsFromDetails, importedText, importLabel, requestBytes, sizeText } from './import-words';

const result = (feedings: number, checks: number, duplicates = 0): ImportResult => ({
  dryRun: true,
  feedings: { new: feedings, duplicate: duplicates },
  riseChecks: { new: checks, duplicate: 0 },
  errors: [],
  preview: [],
});

describe('import words', () => {
  it('names the confirm button after what is new, or offers none', () => {
    expect(importLabel(result(3, 2))).toBe('Import 3 feedings');
    expect(importLabel(result(1, 0))).toBe('Import 1 feeding');
    // New checks for feedings already in the logbook still need importing.
    expect(importLabel(result(0, 2, 1))).toBe('Import 2 rise checks');
    expect(importLabel(result(0, 0, 4))).toBeNull();
  });

  it('says what an import wrote', () => {
    expect(importedText(result(3, 1), 'Bramble')).toBe('Imported 3 feedings and 1 rise check into Bramble.');
    expect(importedText(result(1, 0), 'Pip')).toBe('Imported 1 feeding into Pip.');
  });

  it('places an error by line and the baker’s own header', () => {
    const mapping = { ...suggestMapping([]), temperature_c: 'Jar temp' };
    expect(errorPlace({ line: 4, field: 'temperature_c', message: 'x' }, mapping)).toBe(
      'Line 4, column “Jar temp” (Room or jar temperature (°C))',
    );
    expect(errorPlace({ line: 9, field: 'row', message: 'x' }, mapping)).toBe('Line 9');
    expect(errorPlace({ line: 2, field: 'fed_at', message: 'x' }, mapping)).toBe('Line 2, Fed at');
  });

  it('reads the refusal of a real import back into line errors', () => {
    expect(
      errorsFromDetails([
        { field: 'line 4: temperature_c', message: 'Enter a temperature.' },
        { field: 'csv', message: 'Split the file.' },
      ]),
    ).toEqual([{ line: 4, field: 'temperature_c', message: 'Enter a temperature.' }]);
  });

  it('counts the request as sent: escaped quotes and line breaks and UTF-8 bytes', () => {
    // JSON escapes " and \n as two characters each (RFC 8259 §7); "°" is two bytes in UTF-8.
    expect(requestBytes({ csv: 'a"\n°' })).toBe('{"csv":"a\\"\\n°"}'.length + 1);
    expect(sizeText(1024 * 1024)).toBe('1 MB');
    expect(sizeText(2_500_000)).toBe('2.4 MB');
    expect(sizeText(300)).toBe('1 KB');
    expect(sizeText(1024 * 1024 + 1, 'up')).toBe('1.1 MB');
  });
});
