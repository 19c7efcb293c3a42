import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { sql, type Kysely } from 'kysely';

// Any key will do as long as nothing else in the database uses it.
const MIGRATION_LOCK = 4_842_001;
const FILE_NAME = /^\d{4}_[a-z0-9_]+\.sql$/;

export interface MigrationFile {
  name: string;
  text: string;
  checksum: string;
}

export function readMigrations(dir: string): MigrationFile[] {
  const names = readdirSync(dir)
    .filter((name) => name.endsWith('.sql'))
    .sort();
  return names.map((name) => {
    if (!FILE_NAME.test(name)) throw new Error(`migration ${name} is not named NNNN_snake_case.sql`);
    const text = readFileSync(join(dir, name), 'utf8');
    return { name, text, checksum: createHash('sha256').update(text).digest('hex') };
  });
}

/**
 * Applies the plain-SQL migrations of `dir` in name order, each in its own transaction, and
 * records them. A landed migration is never edited: if one's text changed since it was applied we
 * stop rather than let databases drift apart. Returns the names applied by this call.
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- migrations are frozen in time and must not depend on today's schema types
export async function migrate(db: Kysely<any>, dir: string): Promise<string[]> {
  const files = readMigrations(dir);
  return db.connection().execute(async (conn) => {
    await sql`SELECT pg_advisory_lock(${MIGRATION_LOCK})`.execute(conn);
    try {
      await sql`
        CREATE TABLE IF NOT EXISTS schema_migration (
          name text PRIMARY KEY,
          checksum text NOT NULL,
          applied_at timestamptz NOT NULL DEFAULT now()
        )`.execute(conn);
      const done = await sql<{ name: string; checksum: string }>`
        SELECT name, checksum FROM schema_migration`.execute(conn);
      const applied = new Map(done.rows.map((row) => [row.name, row.checksum]));
      const ran: string[] = [];
      for (const file of files) {
        const checksum = applied.get(file.name);
        if (checksum !== undefined) {
          if (checksum !== file.checksum) {
            throw new Error(`migration ${file.name} was edited after it was applied; add a new one instead`);
          }
          continue;
        }
        await conn.transaction().execute(async (trx) => {
          await sql.raw(file.text).execute(trx);
          await sql`INSERT INTO schema_migration (name, checksum) VALUES (${file.name}, ${file.checksum})`.execute(trx);
        });
        ran.push(file.name);
      }
      return ran;
    } finally {
      await sql`SELECT pg_advisory_unlock(${MIGRATION_LOCK})`.execute(conn);
    }
  });
}
