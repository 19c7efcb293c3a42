import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { frictionFrom, presetFriction, waterDefaults, waterFor } from './water-temperature';

// Worked examples: test-fixtures/reference/baking/ddt_worked_examples.csv (sources per row there and
// in SOURCES.md §6a: SFBI Artisan I 2009; Pizza Today June 2018; an eHow text [weak]; two rows derived).
const csv = readFileSync(
  fileURLToPath(new URL('../../../../../test-fixtures/reference/baking/ddt_worked_examples.csv', import.meta.url)),
  'utf8',
);
const rows = csv
  .trim()
  .split('\n')
  .slice(1)
  .map((line) => line.split(','))
  .map(([id, unit, factors, ddt, room, flour, preferment, friction, water]) => ({
    id: id!,
    unit: unit as 'C' | 'F',
    factors: Number(factors),
    ddt: ddt!,
    room: room!,
    flour: flour!,
    preferment: preferment!,
    friction: friction!,
    water: Number(water),
  }));

describe('water temperature from the form', () => {
  it.each(rows)('gives the worked example $id', (row) => {
    const values = {
      ...waterDefaults(row.unit, ''),
      desired: row.ddt,
      room: row.room,
      flour: row.flour,
      withPreferment: row.preferment !== '',
      preferment: row.preferment,
      friction: row.friction,
    };
    const result = waterFor(values, row.unit);
    expect(result?.factors).toBe(row.factors);
    expect(result?.water).toBeCloseTo(row.water, 6);
  });

  it('calibrates friction from a measured dough and lands back on that dough (SFBI example turned round)', () => {
    // SFBI: room 65, flour 65, water 87 °F gave a 75 °F dough with friction 8 °F.
    const friction = frictionFrom({ room: '65', flour: '65', preferment: '', water: '87', dough: '75' }, false, 'F');
    expect(friction?.friction).toBeCloseTo(8, 9);
  });

  it('needs the levain temperature when the dough has one, and otherwise waits for every number', () => {
    const values = waterDefaults('C', '');
    expect(waterFor({ ...values, preferment: '' }, 'C')).toBeNull();
    expect(waterFor({ ...values, desired: '' }, 'C')).toBeNull();
    expect(waterFor(values, 'C')?.factors).toBe(4);
  });

  it('works out ice only when the tap is warmer than the water must be', () => {
    const values = { ...waterDefaults('C', '700'), desired: '24', room: '27', flour: '27', preferment: '27' };
    const warm = waterFor({ ...values, tap: '25' }, 'C');
    expect(warm!.waterC).toBeLessThan(25);
    expect(warm!.ice!.iceG).toBeGreaterThan(0);
    expect(warm!.ice!.iceG + warm!.ice!.tapWaterG).toBeCloseTo(700, 9);
    const cold = waterFor({ ...values, tap: '5' }, 'C');
    expect(cold!.ice).toBeUndefined();
  });

  it('turns a mixing method into a friction factor in the baker’s unit (°F ÷ 1.8 = °C, no offset)', () => {
    expect(presetFriction('stand', 'F')).toBe(25);
    expect(presetFriction('stand', 'C')).toBe(13.9);
    expect(presetFriction('own', 'C')).toBeNull();
  });
});
