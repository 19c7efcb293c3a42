import { OWNER_ONLY, OWNER_OR_SHARED, type ObjectSet } from './access-matrix.model.js';
import type { MatrixRoute } from './access-matrix.table.js';

// Jar and crumb photos: only the log's owner adds, captions or deletes them (404 for everyone
// else, the instructor too); whoever may read the log (owner, class instructor) lists and views.

const STUDENT_LOG = { shared: ['account', 'logbook'] as const };
const upload = (path: (o: ObjectSet) => string): MatrixRoute => ({
  access: OWNER_ONLY,
  on: 'objects',
  path,
  upload: true,
});
const read = (path: (o: ObjectSet) => string): MatrixRoute => ({
  access: OWNER_OR_SHARED,
  on: 'objects',
  path,
  reveals: { shared: [...STUDENT_LOG.shared] },
});

export const PHOTO_ROUTES: Record<string, MatrixRoute> = {
  'POST /api/feedings/:feedingId/photos': upload((o) => `/api/feedings/${o.feedingId}/photos`),
  'POST /api/rise-checks/:riseCheckId/photos': upload((o) => `/api/rise-checks/${o.riseCheckId}/photos`),
  'POST /api/plans/:planId/photos': upload((o) => `/api/plans/${o.planId}/photos`),
  'GET /api/feedings/:feedingId/photos': read((o) => `/api/feedings/${o.feedingId}/photos`),
  'GET /api/plans/:planId/photos': read((o) => `/api/plans/${o.planId}/photos`),
  'GET /api/cultures/:cultureId/photos': read((o) => `/api/cultures/${o.cultureId}/photos`),
  'GET /api/photos/:photoId/:variant': read((o) => `/api/photos/${o.photoId}/thumbnail`),
  'PATCH /api/photos/:photoId': {
    access: OWNER_ONLY,
    on: 'objects',
    path: (o) => `/api/photos/${o.photoId}`,
    body: () => ({ caption: 'Domed, just past peak' }),
  },
  'DELETE /api/photos/:photoId': { access: OWNER_ONLY, on: 'objects', path: (o) => `/api/photos/${o.photoId}` },
};
