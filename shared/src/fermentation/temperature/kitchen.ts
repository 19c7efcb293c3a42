// A kitchen logger measures the room, not the dough. A bowl of dough follows the room slowly:
// Newton's law of cooling (the lumped-capacitance model), dT/dt = (T_room − T) / τ, so a dough
// mixed warm cools towards the room over a few hours rather than at once. This turns a room
// series into the dough's estimated series, starting from the dough's temperature at mixing and
// taking every measured dough temperature as the truth at its time (the estimate restarts there).
import { type TemperatureSample } from './series.js';
import { MS_PER_HOUR, formatInstant, parseMs } from './time.js';

/**
 * τ of a home-sized dough (about 1 kg in a bowl) in still kitchen air, hours. From memory, not
 * verified against a measurement: a kilo of dough takes a few hours to come to room temperature,
 * which is 2–3 τ. The model's answer is not very sensitive to it: it moves the bulk's average
 * temperature by a fraction of the mix-to-room difference for the first τ or two.
 */
export const DOUGH_TIME_CONSTANT_HOURS = 1.5;

/** After the last room reading the room is held there; the dough keeps approaching it. */
const TAIL_TAUS = [0.5, 1, 2, 3] as const;

export interface KitchenToDough {
  /** Room readings (any order). */
  kitchen: readonly TemperatureSample[];
  /** Measured dough temperatures (any order); each replaces the estimate at its time. */
  dough: readonly TemperatureSample[];
  /** When the dough was mixed (ms since the epoch). Nothing before it is used. */
  mixMs: number;
  /** The dough's temperature at mixing, °C (the plan's, when nothing was measured then). */
  mixC: number;
  tauHours?: number;
}

interface Point {
  ms: number;
  c: number;
}

const points = (samples: readonly TemperatureSample[]): Point[] =>
  samples.map((s) => ({ ms: parseMs(s.at), c: s.c })).sort((a, b) => a.ms - b.ms);

/** The room at `ms`: linear between readings, held before the first and after the last. */
function roomAt(room: readonly Point[], ms: number): number {
  const first = room[0];
  const last = room[room.length - 1];
  if (!first || !last) return NaN;
  if (ms <= first.ms) return first.c;
  if (ms >= last.ms) return last.c;
  let lo = 0;
  let hi = room.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((room[mid]?.ms ?? 0) <= ms) lo = mid;
    else hi = mid;
  }
  const a = room[lo] as Point;
  const b = room[hi] as Point;
  return b.ms === a.ms ? b.c : a.c + ((b.c - a.c) * (ms - a.ms)) / (b.ms - a.ms);
}

/**
 * The dough's estimated temperatures: one sample at each room reading after mixing (and a few
 * after the last, as the dough keeps settling), plus the measured ones. Over each step the room is
 * taken at its mean over the step, for which the exponential step is exact when the room is
 * constant; with loggers reading every few minutes the error of a linearly changing room is far
 * below a thermometer's. No room readings: the measured dough temperatures alone.
 */
export function doughFromKitchen(input: KitchenToDough): TemperatureSample[] {
  const tauMs = (input.tauHours ?? DOUGH_TIME_CONSTANT_HOURS) * MS_PER_HOUR;
  const room = points(input.kitchen);
  const measured = points(input.dough);
  const at = (p: Point): TemperatureSample => ({ at: formatInstant(p.ms, null), c: Math.round(p.c * 100) / 100 });
  if (room.length === 0) return measured.map(at);

  const last = room[room.length - 1] as Point;
  const roomTimes = room.map((p) => p.ms).filter((ms) => ms > input.mixMs);
  const tail = TAIL_TAUS.map((k) => Math.max(last.ms, input.mixMs) + k * tauMs);
  // Every time the estimate is stepped to: room readings, the measurements and the tail.
  const events = [
    ...roomTimes.map((ms) => ({ ms, measured: null as number | null })),
    ...tail.map((ms) => ({ ms, measured: null as number | null })),
    ...measured.filter((m) => m.ms >= input.mixMs).map((m) => ({ ms: m.ms, measured: m.c })),
  ].sort((a, b) => a.ms - b.ms || Number(a.measured === null) - Number(b.measured === null));

  const out: Point[] = [...measured.filter((m) => m.ms < input.mixMs)];
  let t = input.mixMs;
  let c = input.mixC;
  for (const e of events) {
    if (e.ms > t) {
      const mean = (roomAt(room, t) + roomAt(room, e.ms)) / 2;
      c = mean + (c - mean) * Math.exp(-(e.ms - t) / tauMs);
      t = e.ms;
    }
    if (e.measured !== null) c = e.measured;
    const prev = out[out.length - 1];
    if (prev && prev.ms === t) prev.c = c;
    else out.push({ ms: t, c });
  }
  return out.map(at);
}
