import type { RosterFlag, RosterRow } from '@peakwise/shared';

export interface FlagWords {
  /** On the chip. */
  label: string;
  /** In the tooltip: what it means, in plain words, and what to do. */
  explanation: string;
  color: 'error' | 'warning' | 'info' | 'default';
}

/** Most urgent first: this is also the order of chips in a row and of the summary above the table. */
export const FLAG_ORDER: readonly RosterFlag[] = ['caution', 'sluggish', 'overdue', 'no-rise-checks', 'no-culture'];

export const FLAG_WORDS: Record<RosterFlag, FlagWords> = {
  caution: {
    label: 'Caution',
    explanation:
      'A recent feeding noted pink, orange or fuzzy growth. That culture is discarded, not rescued: the student starts again from a healthy one.',
    color: 'error',
  },
  sluggish: {
    label: 'Sluggish',
    explanation:
      'Compared at the same temperature and ratio, it takes longer and longer to peak, or rises less than it did. Worth a word before the student gives up.',
    color: 'warning',
  },
  overdue: {
    label: 'Overdue',
    explanation: 'Not fed for longer than its routine allows (daily on the counter, weekly in the fridge).',
    color: 'warning',
  },
  'no-rise-checks': {
    label: 'No rise checks',
    explanation: 'Recent feedings have no rise checks, so Peakwise cannot say how it is doing.',
    color: 'info',
  },
  'no-culture': {
    label: 'No culture yet',
    explanation: 'This student has not logged a culture yet.',
    color: 'default',
  },
};

/** A row's flags, most urgent first. */
export function sortedFlags(flags: readonly RosterFlag[]): RosterFlag[] {
  return FLAG_ORDER.filter((f) => flags.includes(f));
}

/** "Pip (Dev Rowan)", or the student alone when there is no culture. */
export function rowName(row: Pick<RosterRow, 'cultureName' | 'studentName'>): string {
  return row.cultureName ? `${row.cultureName} (${row.studentName})` : row.studentName;
}

export interface RosterSummary {
  /** "1 culture needs a look" / "3 need a look" / "Every culture looks fine". */
  headline: string;
  /** One line per flagged row, most urgent first: "Pip (Dev Rowan) — sluggish, no rise checks". */
  lines: { key: string; cultureId: string | null; name: string; flags: RosterFlag[] }[];
}

const urgency = (flags: readonly RosterFlag[]) =>
  Math.min(...flags.map((f) => FLAG_ORDER.indexOf(f)), FLAG_ORDER.length);

/** What the instructor should look at first, from the roster's rows. */
export function rosterSummary(rows: readonly RosterRow[]): RosterSummary {
  const flagged = rows
    .filter((r) => r.flags.length > 0)
    .map((r) => ({
      key: `${r.studentId}:${r.cultureId ?? ''}`,
      cultureId: r.cultureId,
      name: rowName(r),
      flags: sortedFlags(r.flags),
    }))
    // Stable: rows of equal urgency keep the API's order.
    .sort((a, b) => urgency(a.flags) - urgency(b.flags));
  const cultures = rows.filter((r) => r.cultureId !== null).length;
  let headline: string;
  if (flagged.length === 0) {
    headline = cultures === 0 ? 'No cultures logged yet' : 'Every culture looks fine';
  } else {
    headline = `${flagged.length} ${flagged.length === 1 ? 'culture needs' : 'need'} a look`;
  }
  return { headline, lines: flagged };
}

/** "sluggish, no rise checks" for a summary line. */
export function flagList(flags: readonly RosterFlag[]): string {
  return sortedFlags(flags)
    .map((f) => FLAG_WORDS[f].label.toLowerCase())
    .join(', ');
}

/** Trend over the last feedings, in words a student would use of their starter. */
export function trendWords(trend: RosterRow['trend']): string {
  switch (trend) {
    case 'faster':
      return 'Faster';
    case 'slower':
      return 'Slower';
    case 'steady':
      return 'Steady';
    default:
      return '—';
  }
}

/** "5.2 h", "—" when the model has nothing yet. */
export function hoursText(hours: number | null): string {
  return hours === null ? '—' : `${hours.toFixed(1)} h`;
}

/** "2.3 ×", "—". */
export function riseText(multiple: number | null): string {
  return multiple === null ? '—' : `${multiple.toFixed(1)} ×`;
}
