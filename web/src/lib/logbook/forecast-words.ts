import type { CultureSummary } from '@peakwise/shared';
import { formatCountdown, type ReadyWindow } from '@/lib/format/duration';

/** The window the countdown counts to: the forecast's interval, else the running fit's ready window. */
export function readyWindowOf(summary: CultureSummary): ReadyWindow | null {
  if (summary.forecast) {
    return { at: summary.forecast.peakAt, low: summary.forecast.low, high: summary.forecast.high };
  }
  const running = summary.running;
  if (running?.readyFrom && running.readyUntil) {
    return { at: running.peakAt ?? running.readyFrom, low: running.readyFrom, high: running.readyUntil };
  }
  return null;
}

const BASIS_WORDS = {
  readings: 'from this feeding’s rise checks',
  culture: 'from this culture’s past feedings',
  default: 'from typical starters until you’ve logged a few peaks',
} as const;

/** "ready in about 2 h 10 min (1 h 40 min – 2 h 50 min)" and where the number comes from. */
export function forecastWords(summary: CultureSummary, now: Date): { countdown: string | null; basis: string | null } {
  const window = readyWindowOf(summary);
  if (!window) return { countdown: null, basis: null };
  return {
    countdown: formatCountdown(window, now, summary.state === 'ready' ? 'peak' : 'ready'),
    basis: summary.forecast ? BASIS_WORDS[summary.forecast.basis] : BASIS_WORDS.readings,
  };
}
