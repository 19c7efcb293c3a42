import { fitRise, type FitRiseInput, type RiseResult } from '@peakwise/shared';

// A feeding's rise fit depends only on its time, its starting height and its rise checks, and a
// finished feeding's never change; yet the culture summary, the roster and the alert refresh
// refitted every one of them on every request (the bench found ~58 % of the API's CPU there).
// This keeps the answers of the last MAX fits in this process, keyed by exactly those inputs, so
// an edited or added rise check is a new key and never a stale answer.

const MAX = 50_000;
const memo = new Map<string, RiseResult>();

function keyOf(input: FitRiseInput): string {
  return `${input.model ?? ''}|${input.fedAt}|${input.initialHeightMm}|${input.readings.map((r) => `${r.at}=${r.heightMm}`).join(',')}`;
}

/** fitRise, answered from memory for inputs it has fitted before. The result is shared: do not change it. */
export function fitRiseRemembered(input: FitRiseInput): RiseResult {
  const key = keyOf(input);
  const hit = memo.get(key);
  if (hit) {
    // Most recently used last, so the oldest is the first to go.
    memo.delete(key);
    memo.set(key, hit);
    return hit;
  }
  const result = fitRise(input);
  memo.set(key, result);
  if (memo.size > MAX) memo.delete(memo.keys().next().value as string);
  return result;
}
