// Is the culture getting faster or slower? The slope of its log residuals (observed work to peak
// over the fitted work) against feeding index, over the most recent feedings. Residuals already
// have temperature and dilution taken out, so a slope is a change in the culture itself.
import { type PreparedFeeding } from './feedings.js';
import { type KineticsTrend } from './types.js';

/** Recent feedings looked at: about two weeks of daily feeding. */
export const TREND_WINDOW = 12;
/** Fewer feedings than this give no label: a slope from three points is noise. */
const MIN_FEEDINGS = 5;
/** A label needs |t| ≥ 2 and a change of at least 15 % across the window (rule of our own). */
const T_THRESHOLD = 2;
const MIN_CHANGE = 0.15;

export function residualTrend(
  feedings: readonly PreparedFeeding[],
  residuals: Float64Array,
  asOfMs: number | undefined,
): KineticsTrend {
  const recent: number[] = [];
  for (let i = 0; i < feedings.length; i++) {
    const f = feedings[i];
    if (f && (asOfMs === undefined || f.fedAtMs < asOfMs)) recent.push(residuals[i] ?? 0);
  }
  const y = recent.slice(-TREND_WINDOW);
  const n = y.length;
  if (n < MIN_FEEDINGS) {
    return { slopePerFeeding: 0, changeOverWindow: 0, tStatistic: 0, label: 'steady', feedingsInWindow: n };
  }
  const xMean = (n - 1) / 2;
  const yMean = y.reduce((s, v) => s + v, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (i - xMean) ** 2;
    sxy += (i - xMean) * ((y[i] ?? 0) - yMean);
  }
  const slope = sxy / sxx;
  let sse = 0;
  for (let i = 0; i < n; i++) sse += ((y[i] ?? 0) - yMean - slope * (i - xMean)) ** 2;
  const se = Math.sqrt(sse / (n - 2) / sxx);
  const tStatistic = se > 0 ? slope / se : slope === 0 ? 0 : Math.sign(slope) * Infinity;
  const changeOverWindow = Math.expm1(slope * (n - 1));
  const significant = Math.abs(tStatistic) >= T_THRESHOLD && Math.abs(changeOverWindow) >= MIN_CHANGE;
  const label = !significant ? 'steady' : slope > 0 ? 'slower' : 'faster';
  return { slopePerFeeding: slope, changeOverWindow, tStatistic, label, feedingsInWindow: n };
}
