import { createHash, randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Kysely, PostgresDialect, sql } from 'kysely';
import pg from 'pg';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { migrate, readMigrations } from './migrator.js';

// Each test gets an empty scratch schema in the test database and connections whose search_path
// is only that schema, so the migrator's unqualified names (schema_migration, the test tables)
// land there and nowhere else.

type Scratch = Kysely<Record<string, never>>;

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is not set');

const FIRST = '0001_create_flour.sql';
const SECOND = '0002_add_flour_protein.sql';
const THIRD = '0003_create_jar.sql';
const FIRST_SQL = 'CREATE TABLE flour (id serial PRIMARY KEY, name text NOT NULL);\n';
const SECOND_SQL =
  "ALTER TABLE flour ADD COLUMN protein double precision;\nINSERT INTO flour (name, protein) VALUES ('rye', 8.5);\n";

let schema: string;
let dir: string;
const opened: Kysely<Record<string, never>>[] = [];
let admin: pg.Pool;

function open(): Scratch {
  const pool = new pg.Pool({ connectionString: url, max: 2, options: `-c search_path=${schema}` });
  const db = new Kysely<Record<string, never>>({ dialect: new PostgresDialect({ pool }) });
  opened.push(db);
  return db;
}

function write(name: string, text: string): void {
  writeFileSync(join(dir, name), text);
}

async function recorded(db: Scratch): Promise<Array<{ name: string; checksum: string; appliedAt: Date }>> {
  const { rows } = await sql<{ name: string; checksum: string; appliedAt: Date }>`
    SELECT name, checksum, applied_at AS "appliedAt" FROM schema_migration ORDER BY name`.execute(db);
  return rows;
}

async function tableExists(db: Scratch, table: string): Promise<boolean> {
  const { rows } = await sql<{ n: number }>`
    SELECT count(*)::int AS n FROM information_schema.tables
    WHERE table_schema = ${schema} AND table_name = ${table}`.execute(db);
  return rows[0]!.n === 1;
}

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

beforeEach(async () => {
  schema = `migrator_test_${randomBytes(6).toString('hex')}`;
  admin = new pg.Pool({ connectionString: url, max: 1 });
  await admin.query(`CREATE SCHEMA ${schema}`);
  dir = mkdtempSync(join(tmpdir(), 'peakwise-migrations-'));
  // Written out of order on purpose: the migrator must sort by name.
  write(SECOND, SECOND_SQL);
  write(FIRST, FIRST_SQL);
});

afterEach(async () => {
  await Promise.all(opened.splice(0).map((db) => db.destroy()));
  await admin.query(`DROP SCHEMA ${schema} CASCADE`);
  await admin.end();
  rmSync(dir, { recursive: true, force: true });
});

describe('migrate', () => {
  it('applies the files in name order and records each with its checksum', async () => {
    const db = open();
    expect(await migrate(db, dir)).toEqual([FIRST, SECOND]);
    const rows = await recorded(db);
    expect(rows.map((r) => [r.name, r.checksum])).toEqual([
      [FIRST, sha256(FIRST_SQL)],
      [SECOND, sha256(SECOND_SQL)],
    ]);
    const { rows: flour } = await sql<{ name: string; protein: number }>`SELECT name, protein FROM flour`.execute(db);
    expect(flour).toEqual([{ name: 'rye', protein: 8.5 }]);
    expect(await tableExists(db, 'schema_migration')).toBe(true);
  });

  it('is idempotent: a second run applies nothing and changes nothing', async () => {
    const db = open();
    await migrate(db, dir);
    const before = await recorded(db);
    expect(await migrate(db, dir)).toEqual([]);
    expect(await recorded(db)).toEqual(before);
    const { rows } = await sql<{ n: number }>`SELECT count(*)::int AS n FROM flour`.execute(db);
    expect(rows[0]!.n).toBe(1); // the INSERT in the second file ran once
  });

  it('applies only the new file on a later run', async () => {
    const db = open();
    await migrate(db, dir);
    write(THIRD, 'CREATE TABLE jar (id serial PRIMARY KEY);');
    expect(await migrate(db, dir)).toEqual([THIRD]);
    expect(await tableExists(db, 'jar')).toBe(true);
  });

  it('rolls a failing file back whole: no partial table, no record; later files wait', async () => {
    const db = open();
    await migrate(db, dir);
    // The first two statements succeed before the third fails.
    write(THIRD, 'CREATE TABLE jar (id int);\nINSERT INTO jar VALUES (1);\nINSERT INTO no_such_table VALUES (1);\n');
    write('0004_create_lid.sql', 'CREATE TABLE lid (id int);');
    await expect(migrate(db, dir)).rejects.toThrow(/no_such_table/);
    expect(await tableExists(db, 'jar')).toBe(false);
    expect(await tableExists(db, 'lid')).toBe(false);
    expect((await recorded(db)).map((r) => r.name)).toEqual([FIRST, SECOND]);

    // Fixed, it applies: nothing of the failed attempt was recorded and the lock was released.
    write(THIRD, 'CREATE TABLE jar (id int);');
    expect(await migrate(open(), dir)).toEqual([THIRD, '0004_create_lid.sql']);
  });

  it('refuses to run when an applied file was edited, and applies nothing after it', async () => {
    const db = open();
    await migrate(db, dir);
    write(FIRST, FIRST_SQL.replace('name text', 'label text'));
    write(THIRD, 'CREATE TABLE jar (id int);');
    await expect(migrate(db, dir)).rejects.toThrow(`migration ${FIRST} was edited after it was applied`);
    expect(await tableExists(db, 'jar')).toBe(false);
    expect((await recorded(db)).map((r) => r.checksum)).toEqual([sha256(FIRST_SQL), sha256(SECOND_SQL)]);
  });

  it('lets two processes migrate at once and applies each file exactly once', async () => {
    const results = await Promise.all([migrate(open(), dir), migrate(open(), dir)]);
    expect(results.flat().sort()).toEqual([FIRST, SECOND]);
    expect((await recorded(open())).map((r) => r.name)).toEqual([FIRST, SECOND]);
  });
});

describe('readMigrations', () => {
  it('refuses a file not named NNNN_snake_case.sql', () => {
    write('0003-Create-Jar.sql', 'SELECT 1;');
    expect(() => readMigrations(dir)).toThrow(/0003-Create-Jar\.sql is not named NNNN_snake_case\.sql/);
  });

  it('ignores files that are not .sql', () => {
    write('README.md', '# notes');
    expect(readMigrations(dir).map((m) => m.name)).toEqual([FIRST, SECOND]);
  });
});
