import { sql } from 'kysely';
import {
  freshObjects,
  mintResetToken,
  ownerOf,
  relationOf,
  throwawayCookie,
  type World,
} from './access-matrix.fixtures.js';
import {
  OUTCOME_STATUS,
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
import { uniqueEmail } from './helpers.js';

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
  party: Party | null;
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
  // Reads share one set of objects; a route that may write gets its own, and spoils it for the next.
  if (!current || method !== 'GET') current = await freshObjects(world);
  const objects = current;
  if (method !== 'GET') current = null;

  const cells: Cell[] = [];
  for (const role of ROLES) {
    for (const party of route.on === 'objects' ? PARTIES : [null]) {
      const relation = party ? relationOf(world, role, party) : null;
      cells.push({ role, party, relation, expected: route.access.outcome(role, relation) });
    }
  }
  const refused = cells.filter((c) => c.expected !== 'ok');
  const allowed = cells.filter((c) => c.expected === 'ok');

  const before = await fingerprint(world);
  for (const cell of refused) await runCell(world, key, route, cell, objects, tally);
  if ((await fingerprint(world)) !== before) {
    tally.refusedWrites.push(`${key}: requests expected to be refused changed the database`);
  }
  // The owner goes last, so a delete by the owner cannot hide what the others would have got.
  allowed.sort((a, b) => Number(a.relation === 'owned') - Number(b.relation === 'owned'));
  for (const cell of allowed) await runCell(world, key, route, cell, objects, tally);
  tally.routes += 1;
  if (route.on === 'objects') tally.objectRoutes += 1;
}

async function runCell(
  world: World,
  key: string,
  route: MatrixRoute,
  cell: Cell,
  objects: Record<Party, ObjectSet>,
  tally: Tally,
): Promise<void> {
  const method = key.slice(0, key.indexOf(' ')) as 'GET' | 'POST' | 'PATCH' | 'DELETE';
  const caller = world.callers[cell.role];
  const target = cell.party ? objects[cell.party] : NO_TARGET;
  const ctx: BodyContext = {
    caller,
    newEmail: () => uniqueEmail('matrix'),
    spareEmail: world.spare.email,
    resetToken: () => mintResetToken(world),
  };
  const url = typeof route.path === 'string' ? route.path : route.path(target);
  const payload = route.body ? await route.body(target, ctx) : undefined;
  const cookie = route.session === 'throwaway' ? await throwawayCookie(world, caller) : caller.cookie;
  const res = await world.t.app.inject({
    method,
    url,
    payload: payload as never,
    headers: cookie ? { cookie } : {},
  });

  const label = `${key} as ${cell.role}${cell.party ? ` on ${cell.party}'s object (${cell.relation})` : ''}`;
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
    if (ownerOf(party) === role) continue;
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

/**
 * Every row of every table of ours, as one hash. Left out: sessions (every answer rolls their
 * expiry), idempotency keys, and what the alert scheduler and worker change after answering
 * (alert status and times, deliveries) — an alert's read time, which a request sets, stays in.
 */
async function fingerprint(world: World): Promise<string> {
  const tables = await sql<{ name: string }>`
    SELECT table_name AS name FROM information_schema.tables
    WHERE table_schema = 'public' AND table_type = 'BASE TABLE'
      AND table_name NOT IN ('session', 'idempotency_key', 'alert_delivery', 'kysely_migration', 'kysely_migration_lock', 'schema_migration')
    ORDER BY table_name`.execute(world.t.db);
  const parts: string[] = [];
  for (const { name } of tables.rows) {
    const row =
      name === 'alert'
        ? sql`SELECT md5(coalesce(string_agg(id::text || ':' || coalesce(read_at::text, ''), ',' ORDER BY id), '')) AS h FROM alert`
        : sql`SELECT md5(coalesce(string_agg(t::text, ',' ORDER BY t::text), '')) AS h FROM ${sql.table(name)} t`;
    const result = await row.execute(world.t.db);
    parts.push(`${name}=${(result.rows[0] as { h: string }).h}`);
  }
  return parts.join(' ');
}
