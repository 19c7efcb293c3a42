import type { Account } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { planFormDefaults, toPreviewRequest } from './plan-form';

const account: Account = {
  id: 'a',
  email: 'dev@example.test',
  displayName: 'Dev Rowan',
  role: 'baker',
  unitSystem: 'us',
  temperatureUnit: 'F',
  timeZone: 'America/New_York',
  createdAt: '2026-01-01T00:00:00Z',
};

describe('plan form', () => {
  it('starts at tomorrow 09:00 in the baker’s zone with quiet hours and °F temperatures', () => {
    const values = planFormDefaults(account, new Date('2026-12-02T15:00:00Z'), 'f1');
    expect(values.readyAt).toBe('2026-12-03T09:00');
    expect(values.quietOn).toBe(true);
    // 24 °C = 75.2 °F; 4 °C = 39.2 °F; 250 °C = 482 °F, set as 480 (°F = °C × 9/5 + 32).
    expect(values.doughTemperature).toBe('75.2');
    expect(values.fridgeTemperature).toBe('39.2');
    expect(values.ovenTemperature).toBe('480');
  });

  it('sends °C, the zone’s offset and the proof the baker asked for', () => {
    const values = {
      ...planFormDefaults(account, new Date('2026-12-02T15:00:00Z'), 'f1'),
      doughTemperature: '78.8',
      finalProof: 'retard' as const,
    };
    const out = toPreviewRequest(values, account);
    expect('request' in out).toBe(true);
    if (!('request' in out)) return;
    expect(out.request.readyAt).toBe('2026-12-03T09:00:00-05:00');
    expect(out.request.doughTemperatureC).toBe(26);
    expect(out.request.quietHours).toEqual({ from: '23:00', until: '06:30' });
    expect(out.request.steps?.finalProof).toEqual({ kind: 'retard', fridgeC: 4, minHours: 8, maxHours: 16 });
    expect(out.request.prefer).toBe('overnight-retard');
    expect(out.request.cultureId).toBeNull();
  });

  it('sends no quiet hours when they are off, and names fields that are not numbers', () => {
    const base = planFormDefaults(account, new Date('2026-12-02T15:00:00Z'), 'f1');
    const off = toPreviewRequest({ ...base, quietOn: false, mode: 'start-now' }, account);
    expect('request' in off && off.request.quietHours).toBeNull();
    expect('request' in off && off.request.readyAt).toBeUndefined();
    const bad = toPreviewRequest({ ...base, foldSets: 'four', formulaId: '' }, account);
    expect('problems' in bad && bad.problems.map((p) => p.field)).toEqual(['formulaId', 'foldSets']);
  });
});
