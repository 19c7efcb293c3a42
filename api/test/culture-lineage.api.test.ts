import type { Culture } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectFieldErrors, signUp, type InjectResponse, type SignedUp, send } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let theo: SignedUp;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
});

function call(method: 'GET' | 'POST' | 'PATCH' | 'DELETE', url: string, payload?: unknown): Promise<InjectResponse> {
  return send(t.app, method, url, theo.cookie, payload);
}

async function create(payload: Record<string, unknown>): Promise<Culture> {
  const res = await call('POST', '/api/cultures', payload);
  expect(res.statusCode, res.body).toBe(201);
  return res.json<Culture>();
}

// Lineage: a culture split from another or received from someone. Within one account, no cycles.

describe('lineage', () => {
  async function setParent(id: string, parentCultureId: string | null): Promise<InjectResponse> {
    return call('PATCH', `/api/cultures/${id}`, { parentCultureId });
  }

  it('sets and clears a parent', async () => {
    const mother = await create({ name: 'Larkspur Mother' });
    const bramble = await create({ name: 'Bramble' });
    expect((await setParent(bramble.id, mother.id)).json<Culture>().parentCultureId).toBe(mother.id);
    expect((await setParent(bramble.id, null)).json<Culture>().parentCultureId).toBeNull();
  });

  it('refuses a culture as its own parent or as a descendant of its descendants', async () => {
    const mother = await create({ name: 'Larkspur Mother' });
    const child = await create({ name: 'Bramble', parentCultureId: mother.id });
    const grandchild = await create({ name: 'Bramble II', parentCultureId: child.id });
    for (const [id, parent] of [
      [mother.id, mother.id],
      [mother.id, child.id],
      [mother.id, grandchild.id],
      [child.id, grandchild.id],
    ] as const) {
      const body = expectFieldErrors(await setParent(id, parent), ['parentCultureId']);
      expect(body.details?.[0]?.message).toMatch(/descend/);
    }
    expect((await call('GET', `/api/cultures/${mother.id}`)).json<Culture>().parentCultureId).toBeNull();
    // Moving a culture sideways in its own family is fine.
    const sibling = await create({ name: 'Pip', parentCultureId: mother.id });
    expect((await setParent(grandchild.id, sibling.id)).statusCode).toBe(200);
  });

  it('lets only one of two concurrent opposite changes through, so no cycle is stored', async () => {
    // Several pairs at once, so the requests really overlap in the database.
    const pairs = await Promise.all(
      Array.from({ length: 6 }, async (_, i) => [await create({ name: `A${i}` }), await create({ name: `B${i}` })]),
    );
    const results = await Promise.all(
      pairs.map(async ([a, b]) => Promise.all([setParent(a!.id, b!.id), setParent(b!.id, a!.id)])),
    );
    for (const pair of results) expect(pair.map((r) => r.statusCode).sort()).toEqual([200, 400]);
    const parents = await t.db.selectFrom('culture').select(['id', 'parentCultureId']).execute();
    expect(parents.filter((p) => p.parentCultureId !== null)).toHaveLength(6);
  });

  it("refuses another baker's culture or a missing one as parent", async () => {
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    const theirs = await t.app.inject({
      method: 'POST',
      url: '/api/cultures',
      payload: { name: 'Old Copper' },
      headers: { cookie: amara.cookie },
    });
    const mine = await create({ name: 'Bramble' });
    expectFieldErrors(await setParent(mine.id, theirs.json<Culture>().id), ['parentCultureId']);
    expectFieldErrors(await setParent(mine.id, '00000000-0000-4000-8000-000000000000'), ['parentCultureId']);
  });

  it('keeps the children when the parent is deleted', async () => {
    const mother = await create({ name: 'Larkspur Mother' });
    const child = await create({ name: 'Bramble', parentCultureId: mother.id });
    expect((await call('DELETE', `/api/cultures/${mother.id}`)).statusCode).toBe(204);
    expect((await call('GET', `/api/cultures/${child.id}`)).json<Culture>().parentCultureId).toBeNull();
  });
});
