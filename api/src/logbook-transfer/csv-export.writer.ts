import { CSV_COLUMNS, OBSERVATION_SEPARATOR } from '@peakwise/shared';
import Papa from 'papaparse';
import type { FeedingRow } from '../feeding/feeding.repository.js';
import type { RiseCheckRow } from '../rise-check/rise-check.repository.js';
import { escapeFormula } from './csv-formula-escape.js';

const cell = (value: number | string | null): string => (value === null ? '' : String(value));

/**
 * A culture's feedings as CSV in CSV_COLUMNS order: one row per rise check with the feeding's
 * cells repeated, one row with empty check cells for a feeding without checks. CRLF line ends and
 * a final line end, as RFC 4180 has them. Cells a spreadsheet could run as formulas are escaped.
 */
export function writeFeedingsCsv(feedings: FeedingRow[], checks: RiseCheckRow[]): string {
  const checksOf = new Map<string, RiseCheckRow[]>();
  for (const check of checks) checksOf.set(check.feedingId, [...(checksOf.get(check.feedingId) ?? []), check]);
  const rows: string[][] = [];
  for (const feeding of feedings) {
    const cells = [
      feeding.fedAt.toISOString(),
      cell(feeding.starterG),
      cell(feeding.flourG),
      cell(feeding.waterG),
      cell(feeding.flour),
      cell(feeding.temperatureC),
      cell(feeding.waterTemperatureC),
      cell(feeding.initialHeightMm),
      feeding.observations.join(OBSERVATION_SEPARATOR),
      cell(feeding.notes),
    ];
    const own = checksOf.get(feeding.id) ?? [];
    if (!own.length) rows.push([...cells, '', '', '']);
    for (const check of own) {
      rows.push([...cells, check.takenAt.toISOString(), cell(check.heightMm), cell(check.temperatureC)]);
    }
  }
  const data = rows.map((row) => row.map(escapeFormula));
  const csv = Papa.unparse({ fields: [...CSV_COLUMNS], data }, { header: true, newline: '\r\n' });
  return `${csv}\r\n`;
}
