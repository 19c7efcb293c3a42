import {
  ADDRESSEE_ONLY,
  CLASS_INSTRUCTOR,
  CLASS_MEMBERS,
  CODE_HOLDER,
  INSTRUCTOR_ROLE,
  OWNER_NOT_INSTRUCTOR,
  OWNER_OR_SHARED,
  SIGNED_IN,
  type ObjectSet,
} from './access-matrix.model.js';
import type { MatrixRoute } from './access-matrix.table.js';

// Classroom and comments. A party's objects here are its own class (the party is a student in it,
// its instructor teaches it) and its logs; class-logs routes are also asked through the other
// party's class. The instructor reads, never writes, a current student's log (sql/0010).

const DAY = 86_400_000;
const date = (ms: number) => new Date(ms).toISOString().slice(0, 10);
const inClass =
  (path = '') =>
  (o: ObjectSet) =>
    `/api/classes/${o.classId}${path}`;
/** What the class's instructor may see of their student: who they are and their log. */
const STUDENT_LOG = { shared: ['account', 'logbook'] } as const;
const drill = (path: (o: ObjectSet) => string): MatrixRoute => ({
  access: CLASS_INSTRUCTOR,
  on: 'class-logs',
  path: (o) => `/api/classes/${o.classId}${path(o)}`,
  reveals: { shared: [...STUDENT_LOG.shared] },
});
const shared = () => ({ shared: [...STUDENT_LOG.shared] });

export const CLASSROOM_ROUTES: Record<string, MatrixRoute> = {
  'POST /api/classes': {
    access: INSTRUCTOR_ROLE,
    on: 'caller',
    path: '/api/classes',
    body: () => ({ name: 'Spring Rye', startsOn: date(Date.now()), endsOn: date(Date.now() + 28 * DAY) }),
  },
  'GET /api/classes': { access: SIGNED_IN, on: 'caller', path: '/api/classes' },
  'GET /api/classes/:classId': { access: CLASS_MEMBERS, on: 'objects', path: inClass() },
  'PATCH /api/classes/:classId': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: inClass(),
    body: () => ({ description: 'Bring a jar with a lid.' }),
  },
  'DELETE /api/classes/:classId': { access: CLASS_INSTRUCTOR, on: 'objects', path: inClass(), spoils: 'classes' },
  'GET /api/classes/:classId/members': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: inClass('/members'),
    reveals: { shared: ['account'] },
  },
  'DELETE /api/classes/:classId/members/:studentId': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: (o) => `/api/classes/${o.classId}/members/${o.accountId}`,
    spoils: 'classes',
  },
  'POST /api/classes/:classId/leave': {
    access: OWNER_NOT_INSTRUCTOR,
    on: 'objects',
    path: inClass('/leave'),
    spoils: 'classes',
  },

  'POST /api/classes/:classId/invites': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: inClass('/invites'),
    body: (_o, ctx) => ({ emails: [ctx.newEmail()] }),
  },
  // The fixtures' live link is addressed to the student, so their address is in the list.
  'GET /api/classes/:classId/invites': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: inClass('/invites'),
    reveals: { shared: ['account'] },
  },
  'DELETE /api/classes/:classId/invites/:inviteId': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: (o) => `/api/classes/${o.classId}/invites/${o.inviteId}`,
  },
  'GET /api/class-invites/:token': {
    access: ADDRESSEE_ONLY,
    on: 'objects',
    path: (o) => `/api/class-invites/${o.inviteToken}`,
  },
  'POST /api/class-invites/:token/accept': {
    access: ADDRESSEE_ONLY,
    on: 'objects',
    path: (o) => `/api/class-invites/${o.inviteToken}/accept`,
    spoils: 'classes',
  },
  'GET /api/class-join/:code': { access: CODE_HOLDER, on: 'objects', path: (o) => `/api/class-join/${o.joinCode}` },
  'POST /api/class-join': {
    access: CODE_HOLDER,
    on: 'objects',
    path: '/api/class-join',
    body: (o) => ({ code: o.joinCode }),
    spoils: 'classes',
  },

  'GET /api/classes/:classId/roster': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: inClass('/roster'),
    reveals: shared(),
  },
  'GET /api/classes/:classId/roster.csv': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: inClass('/roster.csv'),
    reveals: shared(),
  },
  'GET /api/classes/:classId/progress': {
    access: CLASS_INSTRUCTOR,
    on: 'objects',
    path: inClass('/progress'),
    reveals: shared(),
  },
  'GET /api/classes/:classId/students/:studentId/cultures': drill((o) => `/students/${o.accountId}/cultures`),
  'GET /api/classes/:classId/students/:studentId/plans': drill((o) => `/students/${o.accountId}/plans`),
  'GET /api/classes/:classId/cultures/:cultureId': drill((o) => `/cultures/${o.cultureId}`),
  'GET /api/classes/:classId/cultures/:cultureId/summary': drill((o) => `/cultures/${o.cultureId}/summary`),
  'GET /api/classes/:classId/cultures/:cultureId/feedings': drill((o) => `/cultures/${o.cultureId}/feedings`),
  'GET /api/classes/:classId/feedings/:feedingId': drill((o) => `/feedings/${o.feedingId}`),
  'GET /api/classes/:classId/feedings/:feedingId/rise-checks': drill((o) => `/feedings/${o.feedingId}/rise-checks`),
  'GET /api/classes/:classId/plans/:planId': drill((o) => `/plans/${o.planId}`),

  // Comments: the log's owner and an instructor who may read the log (any class of theirs the
  // owner is a current member of); only its author deletes a comment.
  'GET /api/feedings/:feedingId/comments': {
    access: OWNER_OR_SHARED,
    on: 'objects',
    path: (o) => `/api/feedings/${o.feedingId}/comments`,
    reveals: shared(),
  },
  'POST /api/feedings/:feedingId/comments': {
    access: OWNER_OR_SHARED,
    on: 'objects',
    path: (o) => `/api/feedings/${o.feedingId}/comments`,
    body: () => ({ body: 'Try a warmer spot tonight.' }),
    reveals: shared(),
  },
  'GET /api/plans/:planId/comments': {
    access: OWNER_OR_SHARED,
    on: 'objects',
    path: (o) => `/api/plans/${o.planId}/comments`,
    reveals: shared(),
  },
  'POST /api/plans/:planId/comments': {
    access: OWNER_OR_SHARED,
    on: 'objects',
    path: (o) => `/api/plans/${o.planId}/comments`,
    body: () => ({ body: 'Shape a little tighter.' }),
    reveals: shared(),
  },
  'DELETE /api/comments/:commentId': {
    access: OWNER_NOT_INSTRUCTOR,
    on: 'objects',
    path: (o) => `/api/comments/${o.commentId}`,
  },
};
