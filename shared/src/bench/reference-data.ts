/// <reference types="node" />
// Reads the reference data sets in test-fixtures/reference/ (provenance in SOURCES.md there).
// Shared by the tests and the benchmark script; this is the only place in bench/ and
// fermentation/ that touches the file system. Paths resolve from this file's URL so the same
// code works from shared/src/bench (vitest) and shared/dist/bench (the built benchmark): both sit
// three levels below the repository root.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const REFERENCE_DIR = fileURLToPath(new URL('../../../test-fixtures/reference/', import.meta.url));

/** A file of the reference folder as text (e.g. a NIST StRD .dat file). */
export function readReferenceText(relativePath: string): string {
  return readFileSync(REFERENCE_DIR + relativePath, 'utf8');
}

/** A CSV file of the reference folder as rows of strings keyed by header (simple CSV with quotes). */
export function readReferenceCsv(relativePath: string): Array<Record<string, string>> {
  const text = readFileSync(REFERENCE_DIR + relativePath, 'utf8');
  const lines = text.split(/\r?\n/).filter((l) => l.trim().length > 0);
  const header = splitCsvLine(lines[0] ?? '');
  return lines.slice(1).map((line) => {
    const cells = splitCsvLine(line);
    return Object.fromEntries(header.map((h, i) => [h, cells[i] ?? '']));
  });
}

function splitCsvLine(line: string): string[] {
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cell += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      cells.push(cell);
      cell = '';
    } else cell += ch;
  }
  cells.push(cell);
  return cells;
}

export interface GausePoint {
  experiment: number;
  temperatureC: number;
  timeH: number;
  amount: number;
}

/**
 * Gause (1932) S. cerevisiae "amount of yeast" vs time at 5.7–39 °C, experiments 1 and 2, as
 * transcribed in the R package gauseR 1.2 (SOURCES.md §7b).
 */
export function gauseYeast(): GausePoint[] {
  return readReferenceCsv('datasets/gause1932_yeast_growth_vs_temperature.csv').map((r) => ({
    experiment: Number(r.experiment),
    temperatureC: Number(r.temperature_C),
    timeH: Number(r.time_h),
    amount: Number(r.yeast_amount),
  }));
}

/** One curve per (temperature, experiment), in file order. */
export function gauseCurves(): Array<{ temperatureC: number; experiment: number; points: GausePoint[] }> {
  const curves = new Map<string, { temperatureC: number; experiment: number; points: GausePoint[] }>();
  for (const p of gauseYeast()) {
    const key = `${p.temperatureC}|${p.experiment}`;
    const curve = curves.get(key) ?? { temperatureC: p.temperatureC, experiment: p.experiment, points: [] };
    curve.points.push(p);
    curves.set(key, curve);
  }
  return [...curves.values()];
}

export interface GanzleRow {
  organism: string;
  temperatureC: number;
  relativeGrowthRate: number;
  relativeGenerationTime: number | null;
}

/** Gänzle's relative generation times of sourdough lactobacilli and yeast (SOURCES.md §1a). */
export function ganzleRelativeRates(): GanzleRow[] {
  return readReferenceCsv('datasets/ganzle_sourdough_relative_generation_time.csv').map((r) => ({
    organism: r.organism ?? '',
    temperatureC: Number(r.temperature_C),
    relativeGrowthRate: Number(r.relative_growth_rate),
    relativeGenerationTime: r.relative_generation_time ? Number(r.relative_generation_time) : null,
  }));
}

export interface DerivedCheck {
  check: string;
  inputs: string;
  output: string;
  value: number;
}

/** models/derived_check_values.csv: spot values worked out from the published formulas. */
export function derivedChecks(check: string): DerivedCheck[] {
  return readReferenceCsv('models/derived_check_values.csv')
    .filter((r) => r.check === check)
    .map((r) => ({ check: r.check ?? '', inputs: r.inputs ?? '', output: r.output ?? '', value: Number(r.value) }));
}

/** "Tmin=4 Topt=32.5 Tmax=41 T=10" → { Tmin: 4, Topt: 32.5, Tmax: 41, T: 10 }. */
export function parseInputs(inputs: string): Record<string, number> {
  const out: Record<string, number> = {};
  for (const m of inputs.matchAll(/([A-Za-z_]+)=(-?[0-9.]+)/g)) {
    if (m[1] && m[2]) out[m[1]] = Number(m[2]);
  }
  return out;
}
