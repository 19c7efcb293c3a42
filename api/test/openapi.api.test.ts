import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './test-app.js';

// The OpenAPI document is committed (api/openapi.json) so API changes show up in review.
// Regenerate with: UPDATE_OPENAPI=1 npm test -- api
const committed = fileURLToPath(new URL('../openapi.json', import.meta.url));

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

it('serves the OpenAPI document that is committed in api/openapi.json', async () => {
  const res = await t.app.inject({ method: 'GET', url: '/api/docs/openapi.json' });
  expect(res.statusCode).toBe(200);
  const served = JSON.stringify(res.json(), null, 2) + '\n';
  if (process.env.UPDATE_OPENAPI === '1') writeFileSync(committed, served);
  expect(existsSync(committed), 'api/openapi.json is missing').toBe(true);
  expect(served, 'api/openapi.json is stale: run UPDATE_OPENAPI=1 npm test -- api').toBe(
    readFileSync(committed, 'utf8'),
  );
});

it('documents every route under /api', async () => {
  const doc = (await t.app.inject({ method: 'GET', url: '/api/docs/openapi.json' })).json<{
    paths: Record<string, unknown>;
  }>();
  expect(Object.keys(doc.paths).sort()).toEqual(
    [
      '/api/account',
      '/api/account/password',
      '/api/account/delete',
      '/api/account/export.json',
      '/api/admin/accounts',
      '/api/admin/accounts/{id}/role',
      '/api/admin/accounts/{id}/status',
      '/api/account/alert-preferences',
      '/api/alerts',
      '/api/alerts/unread-count',
      '/api/alerts/read-all',
      '/api/alerts/{id}/read',
      '/api/auth/sign-in',
      '/api/auth/sign-out',
      '/api/auth/sign-up',
      '/api/auth/password-reset',
      '/api/auth/password-reset/confirm',
      '/api/dev/mail',
      '/api/cultures',
      '/api/cultures/{id}',
      '/api/cultures/{id}/summary',
      '/api/cultures/{id}/export.csv',
      '/api/cultures/{id}/import',
      '/api/cultures/{cultureId}/feedings',
      '/api/feedings/{id}',
      '/api/formulas',
      '/api/formulas/compute',
      '/api/formulas/{id}',
      '/api/feedings/{feedingId}/rise-checks',
      '/api/feedings/{feedingId}/temperatures',
      '/api/health',
      '/api/plans',
      '/api/plans/preview',
      '/api/plans/{id}',
      '/api/plans/{id}/calendar.ics',
      '/api/plans/{id}/finish',
      '/api/plans/{id}/readings',
      '/api/plans/{id}/kitchen-temperatures',
      '/api/plans/{id}/readings/{readingId}',
      '/api/plans/{id}/steps/{stepId}/done',
      '/api/rise-checks/{id}',
      '/api/feedings/{feedingId}/photos',
      '/api/rise-checks/{riseCheckId}/photos',
      '/api/plans/{planId}/photos',
      '/api/cultures/{cultureId}/photos',
      '/api/photos/{photoId}',
      '/api/photos/{photoId}/{variant}',
      '/api/temperatures/{id}',
      '/api/push/key',
      '/api/push/subscriptions',
      '/api/push/subscriptions/{id}',
      '/api/push/subscriptions/{id}/test',
      '/api/classes',
      '/api/classes/{classId}',
      '/api/classes/{classId}/members',
      '/api/classes/{classId}/members/{studentId}',
      '/api/classes/{classId}/leave',
      '/api/classes/{classId}/invites',
      '/api/classes/{classId}/invites/{inviteId}',
      '/api/class-invites/{token}',
      '/api/class-invites/{token}/accept',
      '/api/class-join/{code}',
      '/api/class-join',
      '/api/classes/{classId}/roster',
      '/api/classes/{classId}/roster.csv',
      '/api/classes/{classId}/progress',
      '/api/classes/{classId}/students/{studentId}/cultures',
      '/api/classes/{classId}/students/{studentId}/plans',
      '/api/classes/{classId}/cultures/{cultureId}',
      '/api/classes/{classId}/cultures/{cultureId}/summary',
      '/api/classes/{classId}/cultures/{cultureId}/feedings',
      '/api/classes/{classId}/feedings/{feedingId}',
      '/api/classes/{classId}/feedings/{feedingId}/rise-checks',
      '/api/classes/{classId}/plans/{planId}',
      '/api/feedings/{feedingId}/comments',
      '/api/plans/{planId}/comments',
      '/api/comments/{commentId}',
    ].sort(),
  );
});
