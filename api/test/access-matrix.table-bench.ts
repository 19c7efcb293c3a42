import { OWNER_ONLY, SIGNED_IN } from './access-matrix.model.js';
import type { MatrixRoute } from './access-matrix.table.js';
import { COUNTRY_LOAF, START_NOW, planBody } from './bake-plan.fixtures.js';

// Formulas and the Bench (bake plans): private to the owner like the logbook. A plan's body names
// a formula and a culture, so another's ids in the body must answer 404 as they do in the path.

const plan =
  (path = '') =>
  (o: { planId: string }) =>
    `/api/plans/${o.planId}${path}`;

export const BENCH_ROUTES: Record<string, MatrixRoute> = {
  'POST /api/formulas/compute': {
    access: SIGNED_IN,
    on: 'caller',
    path: '/api/formulas/compute',
    body: () => ({ ingredients: COUNTRY_LOAF.ingredients }),
  },
  'POST /api/formulas': {
    access: SIGNED_IN,
    on: 'caller',
    path: '/api/formulas',
    body: () => ({ ...COUNTRY_LOAF, name: 'Weeknight loaf' }),
  },
  'GET /api/formulas': { access: SIGNED_IN, on: 'caller', path: '/api/formulas' },
  'GET /api/formulas/:id': { access: OWNER_ONLY, on: 'objects', path: (o) => `/api/formulas/${o.formulaId}` },
  'PATCH /api/formulas/:id': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/formulas/${o.formulaId}`,
    body: () => ({ ingredients: COUNTRY_LOAF.ingredients }),
  },
  'DELETE /api/formulas/:id': { access: OWNER_ONLY, on: 'objects', path: (o) => `/api/formulas/${o.formulaId}` },

  'POST /api/plans/preview': {
    access: OWNER_ONLY,
    on: 'objects',
    path: '/api/plans/preview',
    body: (o) => ({ formulaId: o.formulaId, cultureId: o.cultureId, ...START_NOW }),
  },
  'POST /api/plans': {
    access: OWNER_ONLY,
    on: 'objects',
    path: '/api/plans',
    body: (o) => planBody(o.formulaId, { cultureId: o.cultureId }),
  },
  'GET /api/plans': { access: SIGNED_IN, on: 'caller', path: '/api/plans' },
  'GET /api/plans/:id': { access: OWNER_ONLY, on: 'objects', path: plan() },
  'PATCH /api/plans/:id': { access: OWNER_ONLY, on: 'objects', path: plan(), body: () => ({ name: 'Saturday bake' }) },
  'DELETE /api/plans/:id': { access: OWNER_ONLY, on: 'objects', path: plan() },
  'GET /api/plans/:id/calendar.ics': { access: OWNER_ONLY, on: 'objects', path: plan('/calendar.ics') },
  'POST /api/plans/:id/steps/:stepId/done': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/plans/${o.planId}/steps/${o.checkedStepId}/done`,
    body: () => ({}),
  },
  'DELETE /api/plans/:id/steps/:stepId/done': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/plans/${o.planId}/steps/${o.checkedStepId}/done`,
  },
  'POST /api/plans/:id/readings': {
    access: OWNER_ONLY,
    on: 'objects',
    path: plan('/readings'),
    body: () => ({ takenAt: new Date(Date.now() - 1000).toISOString(), temperatureC: 24.5 }),
  },
  'DELETE /api/plans/:id/readings/:readingId': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/plans/${o.planId}/readings/${o.planReadingId}`,
  },
  'POST /api/plans/:id/kitchen-temperatures': {
    access: OWNER_ONLY,
    on: 'objects',
    path: plan('/kitchen-temperatures'),
    body: () => ({ readings: [{ takenAt: new Date(Date.now() - 1000).toISOString(), temperatureC: 21.5 }] }),
  },
  'GET /api/plans/:id/kitchen-temperatures': { access: OWNER_ONLY, on: 'objects', path: plan('/kitchen-temperatures') },
  'DELETE /api/plans/:id/kitchen-temperatures': {
    access: OWNER_ONLY,
    on: 'objects',
    path: plan('/kitchen-temperatures'),
  },
  'POST /api/plans/:id/finish': {
    access: OWNER_ONLY,
    on: 'objects',
    path: plan('/finish'),
    spoils: 'objects',
    body: () => ({ notes: 'Open crumb, a little pale', rating: 4 }),
  },
};
