import type { PlanStep, PlanStepKind } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { allDone, compactSteps, currentStep, lastDoneStep, timelineRows } from './timeline';

function step(id: string, kind: PlanStepKind, startAt: string, action: boolean, done = false, set?: number): PlanStep {
  return {
    id,
    kind,
    startAt,
    endAt: startAt,
    action,
    done,
    inQuietHours: false,
    uncertainty: null,
    cautions: [],
    ...(set ? { set } : {}),
  };
}

const steps = [
  step('mix', 'mix', '2026-12-03T09:00:00+01:00', true, true),
  step('bulk', 'bulk', '2026-12-03T09:15:00+01:00', false),
  step('fold-1', 'fold', '2026-12-03T09:45:00+01:00', true, true, 1),
  step('fold-2', 'fold', '2026-12-03T10:15:00+01:00', true, false, 2),
  step('shape', 'shape', '2026-12-03T15:00:00+01:00', true),
  step('retard', 'retard', '2026-12-03T15:30:00+01:00', false),
  step('bake', 'bake', '2026-12-04T08:00:00+01:00', true),
];

describe('currentStep', () => {
  it('is the first hands-on step not checked off, passing over waiting steps', () => {
    expect(currentStep(steps)?.id).toBe('fold-2');
    const checked = [
      { stepId: 'fold-1', startedAt: '2026-12-03T09:50:00+01:00', endedAt: '2026-12-03T09:55:00+01:00' },
      { stepId: 'mix', startedAt: '2026-12-03T09:00:00+01:00', endedAt: null },
    ];
    expect(lastDoneStep(steps, checked)?.id).toBe('fold-1');
    expect(lastDoneStep(steps, [])).toBeNull();
    expect(allDone(steps)).toBe(false);
  });

  it('is none once every hands-on step is done', () => {
    const done = steps.map((s) => ({ ...s, done: s.action ? true : s.done }));
    expect(currentStep(done)).toBeNull();
    expect(allDone(done)).toBe(true);
  });
});

describe('timelineRows', () => {
  it('puts the now-marker before the first step not yet started and a heading per day', () => {
    const rows = timelineRows(steps, 'Europe/Berlin', new Date('2026-12-03T09:20:00Z')); // 10:20 in Berlin
    expect(rows.map((r) => (r.type === 'step' ? r.step.id : r.type))).toEqual([
      'day',
      'mix',
      'bulk',
      'fold-1',
      'fold-2',
      'now',
      'shape',
      'retard',
      'day',
      'bake',
    ]);
    expect(rows.filter((r) => r.type === 'step' && r.current).map((r) => r.type === 'step' && r.step.id)).toEqual([
      'fold-2',
    ]);
  });

  it('puts the marker last when every step has begun', () => {
    const rows = timelineRows(steps, 'Europe/Berlin', new Date('2026-12-05T00:00:00Z'));
    expect(rows[rows.length - 1]?.type).toBe('now');
  });
});

describe('compactSteps', () => {
  it('keeps hands-on steps and the long waits, and folds the sets into one line', () => {
    const out = compactSteps(steps);
    expect(out.map((c) => c.step.id)).toEqual(['mix', 'bulk', 'fold-1', 'shape', 'retard', 'bake']);
    expect(out[2]).toMatchObject({ sets: 2, lastAt: '2026-12-03T10:15:00+01:00', quiet: false });
  });

  it('flags a run of folds when any set falls in quiet hours', () => {
    const late = steps.map((s) => (s.id === 'fold-2' ? { ...s, inQuietHours: true } : s));
    expect(compactSteps(late)[2]?.quiet).toBe(true);
  });
});
