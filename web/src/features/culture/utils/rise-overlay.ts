import { fitRise, gompertz, logistic, type Feeding, type RiseCheck, type RisePoint } from '@peakwise/shared';

export interface OverlaySeries {
  feedingId: string;
  fedAt: string;
  readings: RisePoint[];
  /** The fitted curve on the shared grid; null where it is not drawn (before 0 or past its end). */
  curve: (number | null)[];
  peakHours: number | null;
}

export interface RiseOverlay {
  /** Hours since each feeding, shared by every curve. */
  grid: number[];
  series: OverlaySeries[];
}

const GRID_POINTS = 61;
/** The curve is drawn a little past its peak, as on the running feeding. */
const PAST_PEAK = 1.3;

const hoursSince = (from: string, to: string) => (Date.parse(to) - Date.parse(from)) / 3_600_000;

/**
 * Several feedings' rises on one clock (hours since each feeding): readings as multiples of the
 * starting height, and each one's curve fitted by the shared model (fitRise), so the overlay is
 * the same fit the summary makes for the running feeding.
 */
export function riseOverlay(feedings: { feeding: Feeding; checks: RiseCheck[] }[]): RiseOverlay {
  const prepared = feedings.flatMap(({ feeding, checks }) => {
    const h0 = feeding.initialHeightMm;
    if (h0 === null || checks.length === 0) return [];
    const readings = checks
      .map((c) => ({ hours: hoursSince(feeding.fedAt, c.takenAt), multiple: c.heightMm / h0 }))
      .sort((a, b) => a.hours - b.hours);
    const rise = fitRise({
      fedAt: feeding.fedAt,
      initialHeightMm: h0,
      readings: checks.map((c) => ({ at: c.takenAt, heightMm: c.heightMm })),
    });
    const fit = rise.fit && rise.fit.model !== 'richards' ? rise.fit : null;
    const lastHours = readings[readings.length - 1]?.hours ?? 0;
    const end = fit ? (rise.hoursToPeak !== null ? PAST_PEAK * rise.hoursToPeak : lastHours) : 0;
    return [{ feeding, readings, fit, end, peakHours: rise.hoursToPeak }];
  });
  const maxHours = Math.max(1, ...prepared.map((p) => Math.max(p.end, ...p.readings.map((r) => r.hours))));
  const grid = Array.from({ length: GRID_POINTS }, (_, i) => (maxHours * i) / (GRID_POINTS - 1));
  return {
    grid,
    series: prepared.map(({ feeding, readings, fit, end, peakHours }) => ({
      feedingId: feeding.id,
      fedAt: feeding.fedAt,
      readings,
      peakHours,
      curve: grid.map((t) => {
        if (!fit || t > end + 1e-9) return null;
        const y =
          fit.model === 'logistic' ? logistic(t, fit.A, fit.muMax, fit.lag) : gompertz(t, fit.A, fit.muMax, fit.lag);
        return 1 + y;
      }),
    })),
  };
}
