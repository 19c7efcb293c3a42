import { celsiusToFahrenheit, type CultureKineticsSummary, type TemperatureUnit } from '@peakwise/shared';
import { formatDuration } from '@/lib/format/duration';

type Curve = CultureKineticsSummary['hoursToPeakAt'];

/** Hours to peak at `t` °C, interpolated in log-hours between the two nearest sampled temperatures. */
export function hoursAt(curve: Curve, t: number): number | null {
  const points = [...curve].sort((a, b) => a.temperatureC - b.temperatureC);
  if (points.length === 0) return null;
  const exact = points.find((p) => Math.abs(p.temperatureC - t) < 1e-9);
  if (exact) return exact.hours;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (a.temperatureC <= t && t <= b.temperatureC) {
      const f = (t - a.temperatureC) / (b.temperatureC - a.temperatureC);
      return Math.exp(Math.log(a.hours) + f * (Math.log(b.hours) - Math.log(a.hours)));
    }
  }
  return null;
}

/**
 * Hours to peak 5 °C above the reference: read off the model's curve, or, when the curve stops
 * short of it, carried on at the curve's own log-slope from the reference to its nearest end.
 */
export function hoursFiveWarmer(curve: Curve, ref: number, base: number): number | null {
  const direct = hoursAt(curve, ref + 5);
  if (direct !== null) return direct;
  const others = curve.filter((p) => Math.abs(p.temperatureC - ref) >= 1 && p.hours > 0);
  if (others.length === 0 || base <= 0) return null;
  const far = others.reduce((a, b) =>
    b.temperatureC > ref && (a.temperatureC < ref || b.temperatureC > a.temperatureC) ? b : a,
  );
  const slope = (Math.log(far.hours) - Math.log(base)) / (far.temperatureC - ref);
  return base * Math.exp(slope * 5);
}

/** 0.33 → "about a third"; in words where a baker would use them, else a rounded percentage. */
export function fractionWords(fraction: number): string {
  const named: [number, string][] = [
    [1 / 4, 'about a quarter'],
    [1 / 3, 'about a third'],
    [1 / 2, 'about half'],
    [2 / 3, 'about two thirds'],
  ];
  for (const [value, words] of named) if (Math.abs(fraction - value) < 0.03) return words;
  return `about ${Math.round(fraction * 20) * 5} %`;
}

function temperatureWords(celsius: number, unit: TemperatureUnit): string {
  return unit === 'F' ? `${Math.round(celsiusToFahrenheit(celsius))} °F` : `${Math.round(celsius)} °C`;
}

/**
 * "At 24 °C a 1:1:1 feeding peaks in about 5 h 10 min; each 5 °C warmer cuts that by about a
 * third." A 5 °C step is 9 °F for a baker reading °F.
 */
export function kineticsSentence(kinetics: CultureKineticsSummary, unit: TemperatureUnit): string {
  const ref = kinetics.referenceTemperatureC;
  const base = kinetics.hoursToPeakAtReference;
  let sentence = `At ${temperatureWords(ref, unit)} a 1:1:1 feeding peaks in about ${formatDuration(base)}`;
  const warmer = hoursFiveWarmer(kinetics.hoursToPeakAt, ref, base);
  if (warmer !== null && warmer < base) {
    const step = unit === 'F' ? '9 °F' : '5 °C';
    sentence += `; each ${step} warmer cuts that by ${fractionWords(1 - warmer / base)}`;
  }
  return `${sentence}.`;
}

export function basisWords(kinetics: CultureKineticsSummary): string {
  if (kinetics.basis === 'default' || kinetics.feedingsUsed === 0) {
    return 'Based on typical starters until you’ve logged a few peaks.';
  }
  const n = kinetics.feedingsUsed;
  return `Based on ${n} feeding${n === 1 ? '' : 's'} of this culture.`;
}

const TREND_WORDS = {
  steady: 'Its pace is steady.',
  faster: 'It has been getting faster lately.',
  slower: 'It has been getting slower lately: a few warm, regular feedings usually wake it up.',
} as const;

export function trendWords(kinetics: CultureKineticsSummary): string {
  return TREND_WORDS[kinetics.trend];
}
