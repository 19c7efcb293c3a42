import type { Culture } from '@peakwise/shared';
import type { CultureRow } from './culture.repository.js';

export function toCulture(row: CultureRow): Culture {
  return {
    id: row.id,
    name: row.name,
    notes: row.notes,
    defaultFlour: row.defaultFlour,
    defaultHydrationPct: row.defaultHydrationPct,
    location: row.location,
    startedOn: row.startedOn,
    parentCultureId: row.parentCultureId,
    archived: row.archivedAt !== null,
    archivedAt: row.archivedAt?.toISOString() ?? null,
    lastFedAt: row.lastFedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
