import { sql } from 'kysely';
import { enrolInClasses } from './access-matrix.classroom.js';
import {
  freshObjects,
  jarPhotoForm,
  mintResetToken,
  relationOf,
  throwawayCookie,
  type World,
} from './access-matrix.fixtures.js';
import {
  OUTCOME_STATUS,
  OWNER_OF,
  PARTIES,
  ROLES,
  outcomeOf,
  type MarkerKind,
  type ObjectSet,
  type Outcome,
  type Party,
  type Relation,
  type RoleName,
} from './access-matrix.model.js';
import type { BodyContext, MatrixRoute } from './access-matrix.table.js';
import { freshKey, uniqueEmail } from './helpers.js';

// Runs one route of the matrix: every role, on every target, in an order where refused requests
// come first (and must leave the database as it was), then the ones that may succeed.

export interface Tally {
  routes: number;
  /** Routes tried on A's and on B's objects (the others once per role). */
  objectRoutes: number;
  cells: number;
  roles: Set<RoleName>;
  unexpected2xx: string[];
  leaks: string[];
  mismatches: string[];
  refusedWrites: string[];
}

export const newTally = (): Tally => ({
  routes: 0,
  objectRoutes: 0,
  cells: 0,
  roles: new Set(),
  unexpected2xx: [],
  leaks: [],
  mismatches: [],
  refusedWrites: [],
});

interface Cell {
  role: RoleName;
  target: ObjectSet | null;
  relation: Relation | null;
  expected: Outcome;
}

/** A caller route has no target: a body builder that reaches for one is a mistake in the table. */
const NO_TARGET = new Proxy({} as ObjectSet, {
  get: (_target, key) => {
    throw new Error(`a route tried on the caller has no target object (asked for ${String(key)})`);
  },
});

let current: Record<Party, ObjectSet> | null = null;

export async function runRoute(world: World, key: string, route: MatrixRoute, tally: Tally): Promise<void> {
  const method = key.slice(0, key.indexOf(' '));
  // Routes share one set of objects until one removes or closes something in it.
  current ??= await freshObjects(world);
  const objects = current;

  const cells: Cell[] = [];
  for (const role of ROLES) {
    for (const target of targetsOf(route, objects)) {
      const relation = target ? relationTo(world, role, target) : null;
      cells.push({ role, target, relation, expected: route.access.outcome(role, relation) });
    }
  }
  const refused = cells.filter((c) => c.expected !== 'ok');
  const allowed = cells.filter((c) => c.expected === 'ok');

  const before = await fingerprint(world);
  for (const cell of refused) await runCell(world, key, route, cell, tally);
  const after = await fingerprint(world);
  const changed = [...after].filter(([table, hash]) => before.get(table) !== hash).map(([table]) => table);
  if (changed.length > 0) {
    tally.refusedWrites.push(`${key}: requests expected to be refused changed ${changed.join(', ')}`);
  }
  // The owner goes last, so a delete by the owner cannot hide what the others would have got.
  allowed.sort((a, b) => Number(a.relation === 'owned') - Number(b.relation === 'owned'));
  for (const cell of allowed) await runCell(world, key, route, cell, tally);
  if (route.spoils === 'classes') await enrolInClasses(world);
  if (route.spoils || method === 'DELETE') current = null;
  tally.routes += 1;
  if (route.on !== 'caller') tally.objectRoutes += 1;
}

/** A's and B's objects; for class-logs routes also each one asked through the other party's class. */
function targetsOf(route: MatrixRoute, objects: Record<Party, ObjectSet>): (ObjectSet | null)[] {
  if (route.on === 'caller') return [null];
  const own = PARTIES.map((party) => objects[party]);
  if (route.on === 'objects') return own;
  const crossed = PARTIES.map((party): ObjectSet => {
    const other = PARTIES.find((p) => p !== party)!;
    return {
      ...objects[party],
      via: 'other class',
      classId: objects[other].classId,
      joinCode: objects[other].joinCode,
    };
  });
  return [...own, ...crossed];
}

/**
 * Through a class its owner is not in, a log is nobody's to read there. The student of that class
 * still stands to it as the student (their 403 says nothing about the log); all others are foreign.
 */
function relationTo(world: World, role: RoleName, target: ObjectSet): Relation | null {
  if (role === 'anonymous') return null;
  if (target.via === 'own class') return relationOf(world, role, target.party);
  return role === OWNER_OF[PARTIES.find((p) => p !== target.party)!] ? 'owned' : 'foreign';
}

async function runCell(world: World, key: string, route: MatrixRoute, cell: Cell, tally: Tally): Promise<void> {
  const method = key.slice(0, key.indexOf(' ')) as 'GET' | 'POST' | 'PATCH' | 'DELETE';
  const caller = world.callers[cell.role];
  const target = cell.target ?? NO_TARGET;
  const ctx: BodyContext = {
    caller,
    newEmail: () => uniqueEmail('matrix'),
    spareEmail: world.spare.email,
    resetToken: () => mintResetToken(world),
  };
  const url = typeof route.path === 'string' ? route.path : route.path(target);
  const payload = route.body ? await route.body(target, ctx) : undefined;
  const form = route.upload ? await jarPhotoForm() : undefined;
  const cookie = route.session === 'throwaway' ? await throwawayCookie(world, caller) : caller.cookie;
  const res = await world.t.app.inject({
    method,
    url,
    payload: (form?.payload ?? payload) as never,
    headers: { ...(cookie ? { cookie } : {}), ...(method === 'GET' ? {} : freshKey()), ...form?.headers },
  });

  const on = cell.target
    ? ` on ${cell.target.party}'s object${cell.target.via === 'other class' ? ' via the other class' : ''}`
    : '';
  const label = `${key} as ${cell.role}${on}${cell.relation ? ` (${cell.relation})` : ''}`;
  const got = outcomeOf(res.statusCode);
  tally.cells += 1;
  tally.roles.add(cell.role);
  if (got !== cell.expected) {
    tally.mismatches.push(
      `${label}: expected ${OUTCOME_STATUS[cell.expected]} (${cell.expected}), got ${res.statusCode} ${res.body.slice(0, 160)}`,
    );
    if (got === 'ok') tally.unexpected2xx.push(label);
  }
  const sent = url + (payload === undefined ? '' : JSON.stringify(payload));
  for (const leak of leakedMarkers(world, route, cell.role, res.body, sent)) tally.leaks.push(`${label}: ${leak}`);
}

/** Another baker's private strings in an answer, unless the route may show them to this role. */
function leakedMarkers(world: World, route: MatrixRoute, role: RoleName, body: string, sent: string): string[] {
  const leaks: string[] = [];
  for (const party of PARTIES) {
    if (OWNER_OF[party] === role) continue;
    const shared = relationOf(world, role, party) === 'shared';
    const mayShow = new Set<MarkerKind>([
      ...(shared ? (route.reveals?.shared ?? []) : []),
      ...(role === 'admin' ? (route.reveals?.admin ?? []) : []),
    ]);
    for (const [kind, markers] of Object.entries(world.markers[party]) as [MarkerKind, Set<string>][]) {
      if (mayShow.has(kind)) continue;
      // A string the caller sent itself (an id in the path, echoed in a 404) reveals nothing new.
      for (const marker of markers) {
        if (body.includes(marker) && !sent.includes(marker)) leaks.push(`${party}'s ${kind} "${marker}"`);
      }
    }
  }
  return leaks;
}

/** Tables whose rows the app changes after answering, hashed on the columns a request sets. */
const STABLE_COLUMNS: Record<string, string[]> = {
  // The scheduler and worker move status and times; a read time is set by a request.
  alert: ['id', 'read_at'],
  // The push sender notes each attempt's outcome on the device.
  push_subscription: ['id', 'account_id', 'endpoint'],
};

/**
 * Every row of every table of ours, hashed per table in one query. Left out: sessions (every
 * answer rolls their expiry), idempotency keys, alert deliveries (the worker's), migrations.
 */
async function fingerprint(world: World): Promise<Map<string, string>> {
  const tables = await sql<{ name: string }>`
    SELECT table_name AS name FROM information_schema.tables
    WHERE table_schema = 'public' AND table_type = 'BASE TABLE'
      AND table_name NOT IN ('session', 'idempotency_key', 'alert_delivery', 'schema_migration')
    ORDER BY table_name`.execute(world.t.db);
  const parts = tables.rows.map(({ name }) => {
    const columns = STABLE_COLUMNS[name];
    const row = columns ? sql.raw(columns.map((c) => `coalesce(t.${c}::text, '')`).join(" || ':' || ")) : sql`t::text`;
    return sql`SELECT ${name} AS name, md5(coalesce(string_agg(${row}, ',' ORDER BY ${row}), '')) AS h FROM ${sql.table(name)} t`;
  });
  const result = await sql<{ name: string; h: string }>`${sql.join(parts, sql` UNION ALL `)}`.execute(world.t.db);
  return new Map(result.rows.map((r) => [r.name, r.h]));
}
