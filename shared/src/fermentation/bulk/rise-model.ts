// How far a dough has risen after a given amount of fermentation. The culture grows from its
// inoculum exponentially after a lag (kinetics/fit-kinetics.ts): after progress p (hours at 24 °C)
// it has grown by x = k·γ·p/β − h0 in ln units (γ salt/enrichment, k the rate scale fitted from
// the jar). The gas made so far is proportional to the biomass grown, so the rise is
//     rise(x) = R_peak · (eˣ − 1)/(D − 1),
// which is 0 at mixing and R_peak when the culture has grown back by ln D — the point where the
// same culture, fed at this dilution, would peak in its jar. Bulk ends when rise reaches the target.

/** Growth (ln units) at which the rise reaches `targetPct`. */
export function growthForRise(targetPct: number, peakRisePct: number, dilution: number): number {
  return Math.log1p((targetPct * (dilution - 1)) / peakRisePct);
}

/** Rise, %, after growth x (x ≤ 0: still in the lag, no rise). */
export function riseForGrowth(x: number, peakRisePct: number, dilution: number): number {
  return x <= 0 ? 0 : (peakRisePct * Math.expm1(x)) / (dilution - 1);
}

export interface RateScaleFit {
  /** ln of the fitted rate scale. */
  lnK: number;
  /** Posterior standard deviation of ln k. */
  sd: number;
}

/**
 * Fits ln k to aliquot readings: minimise Σ((rise_i − model_i)/σ_R)² + (ln k / σ_prior)², where
 * model_i = riseForGrowth(k·a_i − h0), a_i = γ·p_i/β. σ_R is the reading error of the jar
 * (percentage points) and σ_prior the model's own uncertainty in ln(rate). One parameter: a scan
 * on a log grid brackets the minimum, golden-section search refines it, and the posterior sd
 * comes from the curvature there.
 */
export function fitRateScale(
  points: ReadonlyArray<{ a: number; risePct: number }>,
  h0: number,
  peakRisePct: number,
  dilution: number,
  readingSdPct: number,
  priorSd: number,
): RateScaleFit {
  const objective = (lnK: number): number => {
    const k = Math.exp(lnK);
    let s = (lnK / priorSd) ** 2;
    for (const p of points) {
      const r = riseForGrowth(k * p.a - h0, peakRisePct, dilution);
      s += ((p.risePct - r) / readingSdPct) ** 2;
    }
    return s;
  };
  let best = 0;
  let bestValue = objective(0);
  for (let lnK = -2.5; lnK <= 2.5; lnK += 0.05) {
    const v = objective(lnK);
    if (v < bestValue) [best, bestValue] = [lnK, v];
  }
  let lo = best - 0.05;
  let hi = best + 0.05;
  const phi = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - phi * (hi - lo);
  let x2 = lo + phi * (hi - lo);
  let f1 = objective(x1);
  let f2 = objective(x2);
  for (let i = 0; i < 60; i++) {
    if (f1 < f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - phi * (hi - lo);
      f1 = objective(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + phi * (hi - lo);
      f2 = objective(x2);
    }
  }
  const lnK = (lo + hi) / 2;
  // The objective is a χ², so its second derivative at the minimum is 2 / variance.
  const h = 1e-3;
  const curvature = (objective(lnK + h) - 2 * objective(lnK) + objective(lnK - h)) / (h * h);
  const sd = curvature > 0 ? Math.sqrt(2 / curvature) : priorSd;
  return { lnK, sd: Math.min(sd, priorSd) };
}
