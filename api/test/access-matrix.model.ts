// The words of the authorisation matrix (access-matrix.api.test.ts): who asks, whose object they
// ask about, what they should get, and the policies that turn the first two into the third.

/** Everyone the matrix asks as. Bakers A and B own logbooks; each instructor has a class. */
export const ROLES = ['anonymous', 'bakerA', 'bakerB', 'instructorA', 'instructorOther', 'admin'] as const;
export type RoleName = (typeof ROLES)[number];

/** The owners of the objects a route is tried on: baker A's and baker B's. */
export const PARTIES = ['A', 'B'] as const;
export type Party = (typeof PARTIES)[number];
export type Person = Exclude<RoleName, 'anonymous'>;
export const OWNER_OF: Record<Party, Person> = { A: 'bakerA', B: 'bakerB' };
/** The instructor of the class each party is a member of (access-matrix.classroom.ts). */
export const INSTRUCTOR_OF: Record<Party, Person> = { A: 'instructorA', B: 'instructorOther' };

/**
 * How a caller stands to an object: its owner; an instructor whose class the owner belongs to
 * (the owner's logs are shared with them, read-only); anyone else. Anonymous callers have none.
 * For a party's class the same words hold: the party is its student ('owned'), the class's
 * instructor is 'shared', everyone else 'foreign'.
 */
export type Relation = 'owned' | 'shared' | 'foreign';

/** The expected answer, by status class. */
export type Outcome = 'ok' | 'unauth' | 'forbidden' | 'hidden';

export const OUTCOME_STATUS: Record<Outcome, string> = {
  ok: '2xx',
  unauth: '401',
  forbidden: '403',
  hidden: '404',
};

export function outcomeOf(status: number): Outcome | 'other' {
  if (status >= 200 && status < 300) return 'ok';
  if (status === 401) return 'unauth';
  if (status === 403) return 'forbidden';
  if (status === 404) return 'hidden';
  return 'other';
}

/**
 * One party's objects, made fresh through the API (and one alert row in the database) before
 * every route that writes. Classroom ids join here once its routes exist.
 */
export interface ObjectSet {
  party: Party;
  /**
   * The class in the ids below: the party's own (its instructor reads its logs through it), or the
   * other party's, to ask for a log through a class its owner is not in.
   */
  via: 'own class' | 'other class';
  classId: string;
  joinCode: string;
  accountId: string;
  cultureId: string;
  feedingId: string;
  riseCheckId: string;
  temperatureId: string;
  formulaId: string;
  planId: string;
  /** A step of the plan already checked off, so undoing it has something to undo. */
  checkedStepId: string;
  planReadingId: string;
  alertId: string;
  /** A comment by the owner on the feeding. */
  commentId: string;
  /** A pending invitation to the class, to someone else; and a live link addressed to the owner. */
  inviteId: string;
  inviteToken: string;
  pushDeviceId: string;
  /** A jar photo of the feeding. */
  photoId: string;
}

/** Who a request is sent as. */
export interface Caller {
  role: RoleName;
  /** `peakwise.sid=…`, or null for anonymous. */
  cookie: string | null;
  /** The account's own sign-in, for routes whose valid body is the caller's own credentials. */
  email: string | null;
  password: string | null;
}

/** Private strings of a party, by kind, searched for in every answer to someone else. */
export type MarkerKind = 'account' | 'logbook';

export interface Policy {
  /** Shown in failures and in the summary. */
  name: string;
  outcome(role: RoleName, relation: Relation | null): Outcome;
}

function signedIn(name: string, rule: (role: RoleName, relation: Relation | null) => Outcome): Policy {
  return { name, outcome: (role, relation) => (role === 'anonymous' ? 'unauth' : rule(role, relation)) };
}

/** No session needed; the answer is the same for everyone. */
export const PUBLIC: Policy = { name: 'public', outcome: () => 'ok' };

/** Any signed-in account, acting on itself (its own account, lists, new objects). */
export const SIGNED_IN = signedIn('signed in', () => 'ok');

/** Admins only; other accounts are told no (403), as the route itself is no secret. */
export const ADMIN_ONLY = signedIn('admin only', (role) => (role === 'admin' ? 'ok' : 'forbidden'));

/**
 * The object's owner only. Everyone else gets 404, exactly as for an id that does not exist, so
 * ids reveal nothing — also an instructor the logs are shared with (they read through Classroom)
 * and an admin (admins never need to read private logs).
 */
export const OWNER_ONLY = signedIn('owner only', (_role, relation) => (relation === 'owned' ? 'ok' : 'hidden'));

/** A shared read: the owner and the instructor of the owner's class; 404 for everyone else. */
export const OWNER_OR_SHARED = signedIn('owner or class instructor', (_role, relation) =>
  relation === 'owned' || relation === 'shared' ? 'ok' : 'hidden',
);

/** A policy spelled out per relation, for the classroom's mixes of 403 and 404. */
function byRelation(name: string, outcomes: Record<Relation, Outcome>): Policy {
  return signedIn(name, (_role, relation) => outcomes[relation ?? 'foreign']);
}

/**
 * The class's instructor only. Their student (the owner of the logs, a member) is told no (403:
 * they know the class); anyone else gets 404. Through a class the owner is not in, all is foreign.
 */
export const CLASS_INSTRUCTOR = byRelation('class instructor', { shared: 'ok', owned: 'forbidden', foreign: 'hidden' });

/** The class's instructor and its current members see the class; others get 404. */
export const CLASS_MEMBERS = byRelation('class instructor or member', { shared: 'ok', owned: 'ok', foreign: 'hidden' });

/** Something the owner does alone, that the instructor who can see it may not (403), e.g. leaving, deleting their comment. */
export const OWNER_NOT_INSTRUCTOR = byRelation('owner; instructor told no', {
  owned: 'ok',
  shared: 'forbidden',
  foreign: 'hidden',
});

/** A link addressed to the owner: it works for them alone; anyone else signed in is told no. */
export const ADDRESSEE_ONLY = byRelation('addressee only', { owned: 'ok', shared: 'forbidden', foreign: 'forbidden' });

/** A join code is the authority: anyone signed in may use it, except the class's own instructor (403). */
export const CODE_HOLDER = byRelation('any code holder but the instructor', {
  owned: 'ok',
  shared: 'forbidden',
  foreign: 'ok',
});

/** Instructor and admin accounts (by role, not by class); bakers are told no. */
export const INSTRUCTOR_ROLE = signedIn('instructor or admin role', (role) =>
  role === 'instructorA' || role === 'instructorOther' || role === 'admin' ? 'ok' : 'forbidden',
);
