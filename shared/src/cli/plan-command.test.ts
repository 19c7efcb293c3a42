import { describe, expect, it } from 'vitest';
import { BakersMathError } from '../fermentation/units/bakers-math-error.js';
import { COMMANDS } from './commands.js';
import { InputError, type JsonObject } from './input.js';

const run = (input: unknown) => (COMMANDS.plan as (i: JsonObject) => unknown)(input as JsonObject);

const request = {
  mode: 'ready-at',
  now: '2026-12-04T08:00:00+01:00',
  readyAt: '2026-12-05T10:00:00+01:00',
  timeZone: 'Europe/Berlin',
  quietHours: { from: '23:00', until: '06:00' },
  dough: { flourG: 1000, waterG: 750, starterG: 200, saltG: 20, temperatureC: 24 },
};

function pathOf(input: unknown): string {
  try {
    run(input);
  } catch (error) {
    if (error instanceof InputError || error instanceof BakersMathError) return error.path;
    throw error;
  }
  throw new Error('expected the command to refuse its input');
}

describe('model command line: plan', () => {
  it('answers a ready-at request with both options and picks the retard when the night is in the way', () => {
    const out = run(request) as { recommended: string; options: Array<{ kind: string; fits: boolean }> };
    expect(out.recommended).toBe('overnight-retard');
    expect(out.options.map((o) => [o.kind, o.fits])).toEqual([
      ['same-day', false],
      ['overnight-retard', true],
    ]);
  });

  it("learns the culture's speed from history (a fast culture feeds later for the same mix)", () => {
    type Out = { options: Array<{ kind: string; steps: Array<{ id: string; startAt: string }> }> };
    const lag = (out: Out): number => {
      const steps = out.options[1]?.steps ?? [];
      const at = (id: string) => Date.parse(steps.find((s) => s.id === id)?.startAt ?? '');
      return (at('mix') - at('feed-starter')) / 3_600_000;
    };
    // Four 1:1:1 feedings at 24 °C that peaked in 2.5 h: faster than the defaults (about 4.3 h).
    const history = [0, 1, 2, 3].map((d) => ({
      fedAt: `2026-11-2${d}T08:00:00+01:00`,
      starterG: 50,
      flourG: 50,
      waterG: 50,
      temperatureC: 24,
      peakAt: `2026-11-2${d}T10:30:00+01:00`,
    }));
    expect(lag(run({ ...request, history }) as Out)).toBeLessThan(lag(run(request) as Out));
  });

  it('re-plans with timing and progress', () => {
    const plan = run(request) as { options: Array<{ timing: unknown; steps: Array<{ id: string; startAt: string }> }> };
    const retard = plan.options[1];
    const mix = retard?.steps.find((s) => s.id === 'mix')?.startAt ?? '';
    const out = run({
      ...request,
      timing: retard?.timing,
      progress: { now: mix, done: [{ id: 'mix', startedAt: mix }] },
    }) as { bulk: { status: string }; steps: Array<{ id: string; done: boolean }> };
    expect(out.bulk.status).toBe('fermenting');
    expect(out.steps.find((s) => s.id === 'mix')?.done).toBe(true);
  });

  it('names the offending field', () => {
    expect(pathOf({ ...request, timeZone: 'Nowhere/Here' })).toBe('timeZone');
    expect(pathOf({ ...request, dough: { ...request.dough, waterG: -1 } })).toBe('dough.waterG');
    expect(pathOf({ ...request, history: [{ fedAt: 'yesterday' }] })).toBe('history.0.temperatureC');
    expect(pathOf({ ...request, kinetics: {} })).toBe('kinetics');
    expect(pathOf({ ...request, timing: 'soon', progress: {} })).toBe('timing');
  });
});
