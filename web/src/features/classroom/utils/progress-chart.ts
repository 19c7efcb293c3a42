import type { ClassProgressSeries } from '@peakwise/shared';
import { dayNumber } from './class-dates';

const WEEK_MS = 7 * 86_400_000;

export interface ProgressLine {
  id: string;
  /** "Pip (Dev Rowan)". */
  label: string;
  cultureId: string;
  /** One value per grid point; null where this culture had no feeding then. */
  data: (number | null)[];
  /** The latest normalised time to peak, hours. */
  latest: number | null;
  /** Change from the first to the latest point, hours (positive: slower). */
  change: number | null;
}

export interface ProgressChart {
  /** Weeks since the class started (0 = its first morning), one per feeding time, ascending. */
  grid: number[];
  lines: ProgressLine[];
}

/**
 * Every culture on one shared x axis (weeks since the class's start day), as the line chart wants
 * it: a culture's value at its own feeding times and null elsewhere, joined by connectNulls.
 */
export function progressChart(series: readonly ClassProgressSeries[], startsOn: string): ProgressChart {
  const start = dayNumber(startsOn) * 86_400_000;
  const weeksOf = (iso: string) => Math.round(((Date.parse(iso) - start) / WEEK_MS) * 1000) / 1000;
  const grid = [...new Set(series.flatMap((s) => s.points.map((p) => weeksOf(p.fedAt))))].sort((a, b) => a - b);
  const index = new Map(grid.map((x, i) => [x, i]));
  const lines = series
    .filter((s) => s.points.length > 0)
    .map((s) => {
      const data: (number | null)[] = grid.map(() => null);
      const points = [...s.points].sort((a, b) => Date.parse(a.fedAt) - Date.parse(b.fedAt));
      for (const p of points) data[index.get(weeksOf(p.fedAt))!] = p.hoursToPeakAtReference;
      const first = points[0]!.hoursToPeakAtReference;
      const latest = points[points.length - 1]!.hoursToPeakAtReference;
      return {
        id: s.cultureId,
        label: `${s.cultureName} (${s.studentName})`,
        cultureId: s.cultureId,
        data,
        latest,
        change: points.length > 1 ? latest - first : null,
      };
    });
  return { grid, lines };
}

/** "week 3" for a point 2.4 weeks after the start (weeks counted from 1, as the class does). */
export function weekLabel(weeks: number): string {
  return `week ${Math.floor(weeks) + 1}`;
}

/** Ticks on whole weeks, or half weeks while the class is young, from the start to past the last point. */
export function weekTicks(grid: readonly number[]): number[] {
  const last = grid.length > 0 ? Math.max(...grid) : 0;
  const step = last < 3 ? 0.5 : 1;
  const ticks: number[] = [];
  for (let t = 0; t <= Math.ceil(last / step) * step + 1e-9; t += step) ticks.push(Math.round(t * 10) / 10);
  return ticks;
}
