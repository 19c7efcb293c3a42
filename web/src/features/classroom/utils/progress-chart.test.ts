import { describe, expect, it } from 'vitest';
import { progressChart, weekLabel, weekTicks } from './progress-chart';

describe('the class chart’s data', () => {
  const series = [
    {
      studentId: 'd',
      studentName: 'Dev Rowan',
      cultureId: 'pip',
      cultureName: 'Pip',
      // Out of order on purpose: the chart sorts by time.
      points: [
        { fedAt: '2026-12-19T00:00:00Z', hoursToPeakAtReference: 7.5 },
        { fedAt: '2026-12-05T00:00:00Z', hoursToPeakAtReference: 5 },
      ],
    },
    {
      studentId: 't',
      studentName: 'Theo Park',
      cultureId: 'bramble',
      cultureName: 'Bramble',
      points: [{ fedAt: '2026-12-08T12:00:00Z', hoursToPeakAtReference: 4.5 }],
    },
    { studentId: 'a', studentName: 'Amara Quist', cultureId: 'copper', cultureName: 'Old Copper', points: [] },
  ];

  it('puts every feeding on one axis of weeks since the start day', () => {
    const chart = progressChart(series, '2026-12-05');
    // 0 d, 3.5 d = 0.5 week, 14 d = 2 weeks.
    expect(chart.grid).toEqual([0, 0.5, 2]);
    expect(chart.lines.map((l) => l.data)).toEqual([
      [5, null, 7.5],
      [null, 4.5, null],
    ]);
  });

  it('labels each line with culture and student, with its latest value and change', () => {
    const [pip, bramble] = progressChart(series, '2026-12-05').lines;
    expect(pip).toMatchObject({ label: 'Pip (Dev Rowan)', latest: 7.5, change: 2.5 });
    expect(bramble).toMatchObject({ label: 'Bramble (Theo Park)', latest: 4.5, change: null });
  });

  it('leaves out a culture with nothing to draw', () => {
    expect(progressChart(series, '2026-12-05').lines.some((l) => l.id === 'copper')).toBe(false);
  });

  it('counts weeks from 1', () => {
    expect(weekLabel(0)).toBe('week 1');
    expect(weekLabel(2.4)).toBe('week 3');
  });

  it('ticks half weeks while the class is young, whole weeks later', () => {
    expect(weekTicks([0.25, 1.1])).toEqual([0, 0.5, 1, 1.5]);
    expect(weekTicks([0, 4.2])).toEqual([0, 1, 2, 3, 4, 5]);
    expect(weekTicks([])).toEqual([0]);
  });
});
