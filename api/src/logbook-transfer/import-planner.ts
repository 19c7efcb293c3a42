import { PREVIEW_ROWS, type ImportResult } from '@peakwise/shared';
import type { FeedingRow } from '../feeding/feeding.repository.js';
import type { RiseCheckRow } from '../rise-check/rise-check.repository.js';
import type { ColumnHeaders } from './csv-header-mapping.js';
import { toCsvRow } from './csv-header-mapping.js';
import type { ParsedCsv } from './csv-reader.js';
import { checkRow } from './import-row.validator.js';
import type { ImportFeeding } from './logbook-transfer.repository.js';

/** What an import would do: the result to answer, and the feedings and checks to write. */
export interface ImportPlan {
  result: ImportResult;
  /** One per feeding time in the file; existing feedings carry only their new checks. */
  items: ImportFeeding[];
}

/** The time to the second: the grain at which two feedings or checks are the same one. */
const second = (iso: string | Date) => Math.floor(new Date(iso).getTime() / 1000);

/**
 * Checks every row and sorts the valid ones into new and duplicate feedings and checks, so that a
 * file imported twice (or into the culture it came from) writes nothing the second time.
 */
export function planImport(
  parsed: ParsedCsv,
  headers: ColumnHeaders,
  existing: { feedings: FeedingRow[]; checks: RiseCheckRow[] },
  dryRun: boolean,
): ImportPlan {
  const feedingIdBySecond = new Map(existing.feedings.map((f) => [second(f.fedAt), f.id]));
  const checkKeys = new Set(existing.checks.map((c) => `${c.feedingId}|${second(c.takenAt)}`));

  const result: ImportResult = {
    dryRun,
    feedings: { new: 0, duplicate: 0 },
    riseChecks: { new: 0, duplicate: 0 },
    errors: [...parsed.errors],
    preview: [],
  };
  const items = new Map<number, ImportFeeding>();

  for (const { line, cells } of parsed.rows) {
    const row = toCsvRow(cells, headers);
    if (result.preview.length < PREVIEW_ROWS) result.preview.push(row);
    const checked = checkRow(row, line);
    result.errors.push(...checked.errors);
    if (checked.errors.length || !checked.feeding) continue;

    const key = second(checked.feeding.fedAt);
    let item = items.get(key);
    if (!item) {
      const existingId = feedingIdBySecond.get(key);
      item = { existingId, feeding: checked.feeding, checks: [] };
      items.set(key, item);
      if (existingId) result.feedings.duplicate++;
      else result.feedings.new++;
    }
    const check = checked.check;
    if (check) {
      // A check of a feeding not yet written is keyed by the feeding's time instead of its id.
      const checkKey = `${item.existingId ?? `new:${key}`}|${second(check.takenAt)}`;
      if (checkKeys.has(checkKey)) {
        result.riseChecks.duplicate++;
      } else {
        checkKeys.add(checkKey);
        item.checks.push(check);
        result.riseChecks.new++;
      }
    }
  }
  return { result, items: [...items.values()] };
}
