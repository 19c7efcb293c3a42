import { JOIN_CODE_ALPHABET, type BakingClass } from '@peakwise/shared';
import { describe, expect, it, vi } from 'vitest';
import { newJoinCode, normaliseJoinCode } from '../src/classroom/join-code.js';
import { created, send, withSignedInBaker, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

// Collisions of random codes are too rare to meet by chance, so this file scripts the draws: the
// first calls of newJoinCode() answer from `scripted`, later ones draw as usual.
const scripted: string[] = [];
vi.mock('../src/classroom/join-code.js', async (importOriginal) => {
  const real = await importOriginal<typeof import('../src/classroom/join-code.js')>();
  return { ...real, newJoinCode: () => scripted.shift() ?? real.newJoinCode() };
});

let t: TestApp;
let ines: SignedUp;
withSignedInBaker({ displayName: 'Ines Marlow' }, (app, baker) => {
  t = app;
  ines = baker;
});

async function createClass(name: string): Promise<BakingClass> {
  await t.db.updateTable('account').set({ role: 'instructor' }).where('id', '=', ines.account.id).execute();
  const body = { name, startsOn: '2026-03-07', endsOn: '2026-04-11' };
  return created<BakingClass>(send(t.app, 'POST', '/api/classes', ines.cookie, body));
}

describe('join codes', () => {
  it('draws another code when a new class’s code is taken', async () => {
    scripted.push('AAAAAAAA', 'AAAAAAAA', 'BBBBBBBB');
    expect((await createClass('Weekend Levain')).joinCode).toBe('AAAAAAAA');
    expect((await createClass('Rye Basics')).joinCode).toBe('BBBBBBBB');
    expect(scripted).toEqual([]);
  });

  it('draws another code when a rotated code is taken', async () => {
    scripted.push('CCCCCCCC', 'DDDDDDDD');
    await createClass('Weekend Levain');
    const rye = await createClass('Rye Basics');
    scripted.push('CCCCCCCC', 'EEEEEEEE');
    const rotated = await created<BakingClass>(
      send(t.app, 'PATCH', `/api/classes/${rye.id}`, ines.cookie, { joinCode: true }),
      200,
    );
    expect(rotated.joinCode).toBe('EEEEEEEE');
  });

  it('draws codes from the alphabet and reads them back case- and space-blind', () => {
    // The mock passes through once nothing is scripted.
    for (let i = 0; i < 200; i++) expect(newJoinCode()).toMatch(new RegExp(`^[${JOIN_CODE_ALPHABET}]{8}$`));
    expect(normaliseJoinCode(' k7qw-3mxp ')).toBe('K7QW3MXP');
  });
});
