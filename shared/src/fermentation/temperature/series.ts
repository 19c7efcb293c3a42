// A temperature history: measured readings, interpolated linearly between them, followed by a
// forecast of step segments ("fridge 4 °C until 07:00, then the 22 °C counter"). Before the first
// reading and after the last known value the temperature is held constant: the best guess a
// kitchen offers without more information.
import { parseMs } from './time.js';

export interface TemperatureSample {
  /** ISO 8601 with offset. */
  at: string;
  /** °C. */
  c: number;
}

/**
 * One planned stretch at a set temperature. It starts at `from` (or where the previous segment
 * or the last reading ends) and lasts until `until`; the last segment may leave `until` out and
 * then holds for ever. Changes are steps: a jar moved to the fridge follows within the hour,
 * which is below the resolution of a peak forecast.
 */
export interface ForecastSegment {
  c: number;
  from?: string;
  until?: string;
}

export interface TemperatureSeries {
  readings: readonly TemperatureSample[];
  forecast?: readonly ForecastSegment[];
}

/**
 * The series as knots (time in hours from `originMs`, °C), linear between knots and constant
 * outside them. Two knots at the same time make a step.
 */
export interface CompiledSeries {
  hours: Float64Array;
  c: Float64Array;
}

/** A series that is `c` at every time. */
export function constantSeries(c: number): TemperatureSeries {
  return { readings: [], forecast: [{ c }] };
}

/** `where` and `index` name the field only when there is something to report. */
function checkC(c: number, where: string, index: number): void {
  if (!Number.isFinite(c) || c < -40 || c > 100) {
    throw new RangeError(`${where}.${index}: temperature ${c} °C is not plausible`);
  }
}

export function compileSeries(series: TemperatureSeries, originMs: number): CompiledSeries {
  if (!series.forecast || series.forecast.length === 0) return compileReadings(series.readings, originMs);
  const knots: Array<[number, number]> = [];
  const readings = series.readings.map((r, i) => {
    checkC(r.c, 'readings', i);
    return { ms: parseMs(r.at), c: r.c, i };
  });
  // Stable order by time, so equal times keep the caller's order (a deliberate step). Logged
  // readings almost always arrive in order; skip the sort then.
  if (readings.some((r, i) => i > 0 && r.ms < (readings[i - 1]?.ms ?? -Infinity))) {
    readings.sort((a, b) => a.ms - b.ms || a.i - b.i);
  }
  for (const r of readings) knots.push([(r.ms - originMs) / 3_600_000, r.c]);

  let cursor = knots.length > 0 ? knots[knots.length - 1]?.[0] : undefined;
  for (const [i, seg] of (series.forecast ?? []).entries()) {
    checkC(seg.c, 'forecast', i);
    const from = seg.from !== undefined ? (parseMs(seg.from) - originMs) / 3_600_000 : cursor;
    const until = seg.until !== undefined ? (parseMs(seg.until) - originMs) / 3_600_000 : undefined;
    if (from !== undefined && cursor !== undefined && from < cursor) {
      throw new RangeError(`forecast.${i} starts before the series it follows`);
    }
    if (from !== undefined && until !== undefined && until < from) {
      throw new RangeError(`forecast.${i} ends before it starts`);
    }
    if (until === undefined && i !== (series.forecast?.length ?? 0) - 1) {
      throw new RangeError(`forecast.${i} has no end but is not the last segment`);
    }
    if (from !== undefined) {
      // Hold the previous value up to the start, then step.
      const prev = knots[knots.length - 1];
      if (prev && from > prev[0]) knots.push([from, prev[1]]);
      knots.push([from, seg.c]);
    }
    if (until !== undefined) {
      if (from === undefined) knots.push([until, seg.c]);
      else if (until > from) knots.push([until, seg.c]);
    } else if (from === undefined) {
      // An open segment with no start and nothing before it: the whole series is this value.
      knots.push([0, seg.c]);
    }
    cursor = until ?? from ?? cursor;
  }
  if (knots.length === 0) throw new RangeError('a temperature series needs at least one reading or forecast segment');
  return { hours: Float64Array.from(knots, (k) => k[0]), c: Float64Array.from(knots, (k) => k[1]) };
}

/**
 * Readings alone, straight into typed arrays: the common case (a logged feeding) and the one the
 * kinetics fit compiles thousands of times, so it avoids intermediate objects.
 */
function compileReadings(readings: readonly TemperatureSample[], originMs: number): CompiledSeries {
  const n = readings.length;
  if (n === 0) throw new RangeError('a temperature series needs at least one reading or forecast segment');
  const hours = new Float64Array(n);
  const c = new Float64Array(n);
  let sorted = true;
  for (let i = 0; i < n; i++) {
    const r = readings[i] as TemperatureSample;
    checkC(r.c, 'readings', i);
    hours[i] = (parseMs(r.at) - originMs) / 3_600_000;
    c[i] = r.c;
    if (i > 0 && (hours[i] ?? 0) < (hours[i - 1] ?? 0)) sorted = false;
  }
  if (sorted) return { hours, c };
  // Stable order by time, so equal times keep the caller's order (a deliberate step).
  const order = [...Array(n).keys()].sort((a, b) => (hours[a] ?? 0) - (hours[b] ?? 0) || a - b);
  return { hours: Float64Array.from(order, (i) => hours[i] ?? 0), c: Float64Array.from(order, (i) => c[i] ?? 0) };
}

/** The temperature at `h` hours from the origin (the later value at a step). */
export function temperatureAt(series: CompiledSeries, h: number): number {
  const n = series.hours.length;
  if (h < (series.hours[0] ?? 0)) return series.c[0] ?? NaN;
  for (let i = n - 1; i >= 0; i--) {
    const hi = series.hours[i] ?? 0;
    if (h >= hi) {
      const next = i + 1 < n ? (series.hours[i + 1] ?? hi) : hi;
      const c0 = series.c[i] ?? NaN;
      if (i + 1 >= n || next === hi) return c0;
      const c1 = series.c[i + 1] ?? c0;
      return c0 + ((c1 - c0) * (h - hi)) / (next - hi);
    }
  }
  return series.c[n - 1] ?? NaN;
}
