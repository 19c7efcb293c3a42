import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

// Test helper: the invented sample files in test-fixtures/logger, split into cells. A plain split
// is enough for these files (no quoted separators); the app tokenises with papaparse.
export function readSample(name: string): string[][] {
  const url = new URL(`../../../test-fixtures/logger/${name}`, import.meta.url);
  const text = readFileSync(fileURLToPath(url), 'utf8');
  const delimiter = text.split(/\r?\n/, 1)[0]?.includes(';') ? ';' : ',';
  return text
    .split(/\r?\n/)
    .filter((line) => line !== '')
    .map((line) => line.split(delimiter).map((cell) => cell.replace(/^"(.*)"$/, '$1')));
}
