// The benchmark's data sets as leave-one-out cases: simulated logbooks (bench/simulate.ts), and
// two real temperature series turned into "feedings" at one dilution — Gause's yeast (time to 95 %
// of the plateau per curve, SOURCES.md §7b) and Gänzle's relative generation times (§1a).
import { type ObservedFeeding, type NextFeeding } from '../fermentation/kinetics/types.js';
import { addHours } from '../fermentation/temperature/time.js';
import { type Case, leaveOneOutCases } from './evaluate.js';
import { gauseFits } from './gause-fits.js';
import { ganzleRelativeRates } from './reference-data.js';
import { type SimulatedCulture } from './simulate.js';

const ORIGIN = '2026-01-01T08:00:00Z';

export function simulatedCases(population: readonly SimulatedCulture[], mode: 'loo' | 'forward'): Case[] {
  return population.flatMap((c) => leaveOneOutCases(c.feedings, c.plans, mode));
}

interface TemperaturePoint {
  temperatureC: number;
  hours: number;
  group: string;
}

/**
 * Leave-one-temperature-out: every point at a temperature is predicted from the points at the
 * other temperatures. The dilution is not known in either source and is the same for all points
 * (1:1:1 is written), so it cancels. "Last feeding" for the baselines is the point at the nearest
 * other temperature in the same group — the most favourable reading of that baseline.
 */
function leaveOneTemperatureOut(points: readonly TemperaturePoint[]): Case[] {
  const feeding = (p: TemperaturePoint, i: number): ObservedFeeding => ({
    fedAt: addHours(ORIGIN, 24 * 30 * i),
    starterG: 1,
    flourG: 1,
    waterG: 1,
    temperatureC: p.temperatureC,
    hoursToPeak: p.hours,
  });
  const all = points.map(feeding);
  const cases: Case[] = [];
  points.forEach((p) => {
    const others = points.map((q, j) => ({ q, j })).filter(({ q }) => q.temperatureC !== p.temperatureC);
    const sameGroup = others.filter(({ q }) => q.group === p.group);
    const nearest = (sameGroup.length ? sameGroup : others).reduce((a, b) =>
      Math.abs(b.q.temperatureC - p.temperatureC) < Math.abs(a.q.temperatureC - p.temperatureC) ? b : a,
    );
    const next: NextFeeding = {
      fedAt: addHours(ORIGIN, 24 * 30 * points.length),
      starterG: 1,
      flourG: 1,
      waterG: 1,
      temperatureC: p.temperatureC,
    };
    const last = all[nearest.j];
    if (!last) return;
    cases.push({
      history: others.map(({ j }) => all[j]).filter((f): f is ObservedFeeding => !!f),
      next,
      actualHours: p.hours,
      last,
    });
  });
  return cases;
}

export function gauseCases(): Case[] {
  return leaveOneTemperatureOut(
    gauseFits().map((f) => ({ temperatureC: f.temperatureC, hours: f.t95, group: `exp${f.experiment}` })),
  );
}

/** Gänzle's table per organism; the relative generation time stands in for hours. */
export function ganzleCases(organism: string): Case[] {
  return leaveOneTemperatureOut(
    ganzleRelativeRates()
      .filter((r) => r.organism === organism && r.relativeGenerationTime !== null)
      .map((r) => ({ temperatureC: r.temperatureC, hours: r.relativeGenerationTime ?? NaN, group: organism })),
  );
}
