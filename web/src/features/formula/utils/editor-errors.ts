import type { FieldError } from '@peakwise/shared';
import { isApiError } from '@/lib/api-client';

/**
 * A live compute's 400 in the form's own terms: the API numbered the lines it was sent, and the
 * editor sends only complete rows, so `ingredients.1.food` may be the form's third row.
 */
export function liveProblems(error: unknown, rows: number[], names: string[]): string[] {
  if (!isApiError(error) || error.status !== 400) return error ? ['The figures could not be worked out just now.'] : [];
  return (error.body.details ?? [{ field: '', message: error.body.message } satisfies FieldError]).map((d) => {
    const match = /^ingredients\.(\d+)\b/.exec(d.field);
    if (!match) return d.message;
    const row = rows[Number(match[1])];
    if (row === undefined) return d.message;
    return `Line ${row + 1} (${names[row] ?? ''}): ${d.message}`;
  });
}

const LINE_FIELDS = ['kind', 'name', 'amount', 'unit', 'food', 'densityGPerMl', 'starterHydrationPct'] as const;
const SCALING_FIELDS = ['scaling.factor', 'scaling.doughG', 'scaling.pieces', 'scaling.pieceG', 'scaling.lossPercent'];

/** Every field name of the form a save's 400 may name (the same names as the API's). */
export function formFields(lines: number, blend: number): string[] {
  return [
    'name',
    'notes',
    ...Array.from({ length: lines }, (_, i) => LINE_FIELDS.map((f) => `ingredients.${i}.${f}`)).flat(),
    ...Array.from({ length: blend }, (_, i) => [`blend.${i}.name`, `blend.${i}.parts`]).flat(),
    ...SCALING_FIELDS,
  ];
}
