import { CamelCasePlugin, Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { DB } from './types.js';

export type Database = Kysely<DB>;

export interface DatabaseHandle {
  db: Database;
  pool: pg.Pool;
}

/** One pool for the whole process: Kysely and the session store share it. */
export function openDatabase(connectionString: string, max = 10): DatabaseHandle {
  const pool = new pg.Pool({ connectionString, max, connectionTimeoutMillis: 5000 });
  // A client that loses its server (PostgreSQL restarted or killed) must not crash the process:
  // an idle one reports through the pool, one in use through itself (its query fails as well,
  // and that failure is what the request answers: 503, see unavailable.ts).
  pool.on('error', () => undefined);
  pool.on('connect', (client) => client.on('error', () => undefined));
  const db = new Kysely<DB>({ dialect: new PostgresDialect({ pool }), plugins: [new CamelCasePlugin()] });
  return { db, pool };
}
