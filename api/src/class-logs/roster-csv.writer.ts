import type { RosterRow, TemperatureUnit } from '@peakwise/shared';
import Papa from 'papaparse';
import { escapeFormula } from '../logbook-transfer/csv-formula-escape.js';

/** The reference of hoursToPeakAtReference, in the viewer's unit (24 °C ≈ 75 °F). */
const REFERENCE: Record<TemperatureUnit, string> = { C: '24 °C', F: '75 °F' };

export function rosterCsvColumns(unit: TemperatureUnit): string[] {
  return [
    'Student',
    'Culture',
    'Last fed (UTC ISO 8601)',
    'Since fed (h)',
    `Time to peak at 1:1:1 and ${REFERENCE[unit]} (h)`,
    'Rise multiple (× starting height)',
    'Trend',
    'Flags',
  ];
}

const fixed = (x: number | null, digits: number): string => (x === null ? '' : x.toFixed(digits));

/**
 * The roster as CSV, every row in the table's order. Names are the students' own text, so cells a
 * spreadsheet could run as formulas are escaped the way the logbook export does it.
 */
export function writeRosterCsv(rows: RosterRow[], unit: TemperatureUnit): string {
  const data = rows.map((r) =>
    [
      r.studentName,
      r.cultureName ?? '',
      r.lastFedAt ?? '',
      fixed(r.hoursSinceFed, 1),
      fixed(r.hoursToPeakAtReference, 1),
      fixed(r.riseMultiple, 2),
      r.trend ?? '',
      r.flags.join('; '),
    ].map(escapeFormula),
  );
  return `${Papa.unparse({ fields: rosterCsvColumns(unit), data }, { header: true, newline: '\r\n' })}\r\n`;
}

/** A file name of safe characters from the class name. */
export function rosterFileName(className: string): string {
  const base = className
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^[-.]+|-+$/g, '')
    .slice(0, 80);
  return `${base || 'class'}-roster.csv`;
}
