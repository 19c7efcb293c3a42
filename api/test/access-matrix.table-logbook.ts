import { CSV_COLUMNS } from '@peakwise/shared';
import { OWNER_ONLY, SIGNED_IN } from './access-matrix.model.js';
import type { MatrixRoute } from './access-matrix.table.js';

// The logbook: cultures, feedings, rise checks, temperature readings, and their files. Private to
// the owner; everyone else's ids answer 404 (instructors read students' logs through Classroom).

const HOUR = 3_600_000;
/** Within the last hours: after the fixtures' feeding (3 h ago), never in the future. */
const hoursAgo = (hours: number) => new Date(Date.now() - hours * HOUR).toISOString();

export const LOGBOOK_ROUTES: Record<string, MatrixRoute> = {
  'POST /api/cultures': { access: SIGNED_IN, on: 'caller', path: '/api/cultures', body: () => ({ name: 'Sorrel' }) },
  'GET /api/cultures': { access: SIGNED_IN, on: 'caller', path: '/api/cultures' },
  'GET /api/cultures/:id': { access: OWNER_ONLY, on: 'objects', path: (o) => `/api/cultures/${o.cultureId}` },
  'PATCH /api/cultures/:id': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/cultures/${o.cultureId}`,
    body: () => ({ notes: 'Kept on the top shelf' }),
  },
  'DELETE /api/cultures/:id': { access: OWNER_ONLY, on: 'objects', path: (o) => `/api/cultures/${o.cultureId}` },
  'GET /api/cultures/:id/summary': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/cultures/${o.cultureId}/summary`,
  },

  'POST /api/cultures/:cultureId/feedings': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/cultures/${o.cultureId}/feedings`,
    body: () => ({ ratio: '1:1:1', totalG: 90 }),
  },
  'GET /api/cultures/:cultureId/feedings': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/cultures/${o.cultureId}/feedings`,
  },
  'GET /api/feedings/:id': { access: OWNER_ONLY, on: 'objects', path: (o) => `/api/feedings/${o.feedingId}` },
  'PATCH /api/feedings/:id': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/feedings/${o.feedingId}`,
    body: () => ({ temperatureC: 24.5 }),
  },
  'DELETE /api/feedings/:id': { access: OWNER_ONLY, on: 'objects', path: (o) => `/api/feedings/${o.feedingId}` },

  'POST /api/feedings/:feedingId/rise-checks': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/feedings/${o.feedingId}/rise-checks`,
    body: () => ({ takenAt: hoursAgo(1), heightMm: 70 }),
  },
  'GET /api/feedings/:feedingId/rise-checks': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/feedings/${o.feedingId}/rise-checks`,
  },
  'PATCH /api/rise-checks/:id': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/rise-checks/${o.riseCheckId}`,
    body: () => ({ heightMm: 56 }),
  },
  'DELETE /api/rise-checks/:id': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/rise-checks/${o.riseCheckId}`,
  },

  'POST /api/feedings/:feedingId/temperatures': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/feedings/${o.feedingId}/temperatures`,
    body: () => ({ readings: [{ takenAt: hoursAgo(1), temperatureC: 22.5 }] }),
  },
  'GET /api/feedings/:feedingId/temperatures': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/feedings/${o.feedingId}/temperatures`,
  },
  'DELETE /api/temperatures/:id': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/temperatures/${o.temperatureId}`,
  },

  'GET /api/cultures/:id/export.csv': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/cultures/${o.cultureId}/export.csv`,
  },
  'POST /api/cultures/:id/import': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/cultures/${o.cultureId}/import`,
    body: () => ({ csv: `${CSV_COLUMNS.join(',')}\n${hoursAgo(2)},20,100,100,,,,40,,,,,\n` }),
  },
};
