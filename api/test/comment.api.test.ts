import { COMMENT_MAX_LENGTH, type CommentListResponse, type CommentView } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { addClass, callAs, commentWorld, leaveClass, type Call, type CommentWorld } from './comment.fixtures.js';
import { created, expectError, expectFieldErrors, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Threads on a feeding and on a bake plan: who may read and write them, the order, deleting, and
// what bad input answers. The alerts a comment causes are in comment-alerts.api.test.ts.

let t: TestApp;
let call: Call;
let w: CommentWorld;
beforeAll(async () => {
  t = await createTestApp();
  call = callAs(t);
});
afterAll(() => t.close());
beforeEach(async () => {
  await resetDatabase(t.db);
  w = await commentWorld(t);
});

const feedingThread = () => `/api/feedings/${w.feeding.id}/comments`;
const planThread = () => `/api/plans/${w.plan.id}/comments`;
const post = (url: string, as: SignedUp, body: string) => created<CommentView>(call('POST', url, as, { body }));
const list = (url: string, as: SignedUp) => created<CommentListResponse>(call('GET', url, as), 200);
const commentCount = async () =>
  Number(
    (
      await t.db
        .selectFrom('comment')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .executeTakeFirstOrThrow()
    ).n,
  );

describe('a thread between the owner and the instructor', () => {
  it.each([
    ['feeding', feedingThread, () => w.feeding.id],
    ['bake-plan', planThread, () => w.plan.id],
  ] as const)('on a %s: both write, both read it oldest first, each sees which are theirs', async (type, url, id) => {
    const first = await post(url(), w.theo, '  Bramble doubled in 5 h at 24 °C, is that slow?  ');
    const second = await post(url(), w.ines, 'A little slow for 1:2:2. Try water at 27 °C next time.');
    expect(first).toMatchObject({
      subjectType: type,
      subjectId: id(),
      author: { id: w.theo.account.id, displayName: 'Theo Park', role: 'owner' },
      body: 'Bramble doubled in 5 h at 24 °C, is that slow?',
      mine: true,
    });
    expect(second.author).toEqual({ id: w.ines.account.id, displayName: 'Ines Marlow', role: 'instructor' });

    const asOwner = await list(url(), w.theo);
    expect(asOwner.total).toBe(2);
    expect(asOwner.items.map((c) => [c.id, c.mine])).toEqual([
      [first.id, true],
      [second.id, false],
    ]);
    const asInstructor = await list(url(), w.ines);
    expect(asInstructor.items.map((c) => [c.id, c.mine, c.author.role])).toEqual([
      [first.id, false, 'owner'],
      [second.id, true, 'instructor'],
    ]);
  });

  it('pages oldest first without overlap, and the feeding and plan threads stay apart', async () => {
    const bodies = ['One', 'Two', 'Three', 'Four', 'Five'];
    for (const [i, body] of bodies.entries()) await post(feedingThread(), i % 2 ? w.ines : w.theo, body);
    await post(planThread(), w.theo, 'About the bake');

    const page1 = await list(`${feedingThread()}?limit=2`, w.theo);
    const page3 = await list(`${feedingThread()}?limit=2&offset=4`, w.theo);
    const page2 = await list(`${feedingThread()}?limit=2&offset=2`, w.theo);
    expect([page1, page2, page3].map((p) => p.items.map((c) => c.body))).toEqual([
      ['One', 'Two'],
      ['Three', 'Four'],
      ['Five'],
    ]);
    expect(page2).toMatchObject({ total: 5, limit: 2, offset: 2 });
    expect((await list(planThread(), w.theo)).items.map((c) => c.body)).toEqual(['About the bake']);
    expectFieldErrors(await call('GET', `${feedingThread()}?limit=0&offset=-1`, w.theo), ['limit', 'offset']);
  });

  it('an instructor teaching the owner in two classes sees the thread once', async () => {
    await addClass(t.db, w.ines.account.id, [w.theo.account.id], 'Weekday Rye');
    await post(feedingThread(), w.theo, 'Hello');
    expect((await list(feedingThread(), w.ines)).items).toHaveLength(1);
  });
});

describe('who may not', () => {
  it('another baker, even a classmate, and an instructor of another class get 404 and write nothing', async () => {
    await post(feedingThread(), w.theo, 'Only for Ines');
    for (const stranger of [w.amara, w.olwen]) {
      for (const url of [feedingThread(), planThread()]) {
        const read = expectError(await call('GET', url, stranger), 404);
        expect(read.message).toMatch(/^No (feeding|bake plan) with this id\.$/);
        expectError(await call('POST', url, stranger, { body: 'Let me in' }), 404);
      }
    }
    expect(await commentCount()).toBe(1);
  });

  it('a feeding or plan that does not exist answers the same 404; a malformed id is a field-named 400', async () => {
    const missing = '00000000-0000-4000-8000-000000000000';
    const a = expectError(await call('GET', `/api/feedings/${missing}/comments`, w.ines), 404);
    const b = expectError(await call('GET', feedingThread(), w.olwen), 404);
    expect(a.message).toBe(b.message);
    expectError(await call('POST', `/api/plans/${missing}/comments`, w.theo, { body: 'x' }), 404);
    expectFieldErrors(await call('GET', '/api/feedings/nope/comments', w.theo), ['feedingId']);
    expectFieldErrors(await call('POST', '/api/plans/nope/comments', w.theo, { body: 'x' }), ['planId']);
    expectFieldErrors(await call('DELETE', '/api/comments/nope', w.theo), ['commentId']);
  });

  it('signed out: 401', async () => {
    expectError(await t.app.inject({ method: 'GET', url: feedingThread() }), 401);
    expectError(await t.app.inject({ method: 'POST', url: planThread(), payload: { body: 'Hi' } }), 401);
  });

  it('a student who leaves: the instructor gets 404 at once (reading, writing, deleting their own), the owner keeps the thread', async () => {
    const hers = await post(feedingThread(), w.ines, 'Looks lively.');
    await post(planThread(), w.ines, 'Good bulk.');
    await leaveClass(t.db, w.classId, w.theo.account.id);

    for (const url of [feedingThread(), planThread()]) {
      expectError(await call('GET', url, w.ines), 404);
      expectError(await call('POST', url, w.ines, { body: 'Still here?' }), 404);
    }
    expectError(await call('DELETE', `/api/comments/${hers.id}`, w.ines), 404);
    const kept = await list(feedingThread(), w.theo);
    expect(kept.items.map((c) => [c.body, c.author.role])).toEqual([['Looks lively.', 'instructor']]);
    expect(await commentCount()).toBe(2);
  });
});

describe('deleting', () => {
  it('the author deletes their own; the other side gets 403, a stranger 404, a deleted one 404', async () => {
    const theos = await post(feedingThread(), w.theo, 'My note');
    const ines = await post(planThread(), w.ines, 'Her note');

    expectError(await call('DELETE', `/api/comments/${ines.id}`, w.theo), 403);
    expectError(await call('DELETE', `/api/comments/${theos.id}`, w.ines), 403);
    expectError(await call('DELETE', `/api/comments/${theos.id}`, w.amara), 404);
    expectError(await call('DELETE', `/api/comments/${ines.id}`, w.olwen), 404);
    expect(await commentCount()).toBe(2);

    expect((await call('DELETE', `/api/comments/${ines.id}`, w.ines)).statusCode).toBe(204);
    expect((await call('DELETE', `/api/comments/${theos.id}`, w.theo)).statusCode).toBe(204);
    expect((await list(feedingThread(), w.theo)).total).toBe(0);
    expect((await list(planThread(), w.ines)).total).toBe(0);
    expectError(await call('DELETE', `/api/comments/${theos.id}`, w.theo), 404);
  });

  it('deleting the feeding or the plan takes its thread with it', async () => {
    await post(feedingThread(), w.ines, 'On the feeding');
    await post(planThread(), w.ines, 'On the plan');
    expect((await call('DELETE', `/api/feedings/${w.feeding.id}`, w.theo)).statusCode).toBe(204);
    expect(await commentCount()).toBe(1);
    expectError(await call('GET', feedingThread(), w.ines), 404);
  });
});

describe('bad input', () => {
  it.each([
    ['empty', { body: '' }, ['body']],
    ['only white space', { body: ' \n\t ' }, ['body']],
    ['too long', { body: 'a'.repeat(COMMENT_MAX_LENGTH + 1) }, ['body']],
    ['missing', {}, ['body']],
    ['null', { body: null }, ['body']],
    ['a number', { body: 42 }, ['body']],
    ['an unknown field', { body: 'Fine', authorId: '00000000-0000-4000-8000-000000000000' }, ['authorId']],
  ])('%s: a 400 naming the field, nothing written', async (_, payload, fields) => {
    expectFieldErrors(await call('POST', feedingThread(), w.ines, payload), fields);
    expectFieldErrors(await call('POST', planThread(), w.theo, payload), fields);
    expect(await commentCount()).toBe(0);
    expect(await t.db.selectFrom('alert').select('id').where('kind', '=', 'comment').execute()).toEqual([]);
  });

  it(`${COMMENT_MAX_LENGTH} characters after trimming fit, counted as characters (not bytes)`, async () => {
    // "°" is two bytes in UTF-8 and one character: the limit is in characters, like the column's CHECK.
    const body = '°'.repeat(COMMENT_MAX_LENGTH);
    const saved = await post(feedingThread(), w.theo, `\n  ${body}  \n`);
    expect(saved.body).toBe(body);
  });

  it('a retried POST with the same Idempotency-Key writes one comment and answers the same', async () => {
    const headers = { 'idempotency-key': 'comment-retry-1' };
    const a = await call('POST', feedingThread(), w.ines, { body: 'Once only' }, headers);
    const b = await call('POST', feedingThread(), w.ines, { body: 'Once only' }, headers);
    expect([a.statusCode, b.statusCode]).toEqual([201, 201]);
    expect(b.headers['idempotent-replayed']).toBe('true');
    expect(b.json<CommentView>().id).toBe(a.json<CommentView>().id);
    expect(await commentCount()).toBe(1);
  });
});
