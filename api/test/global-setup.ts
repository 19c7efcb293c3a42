import { join } from 'node:path';
import { openDatabase } from '../src/db/database.js';
import { migrate } from '../src/db/migrator.js';
import { repoRoot } from '../src/repo-root.js';

/** Builds the test database from sql/ once per run, as production does. */
export default async function setup(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url)
    throw new Error('DATABASE_URL is not set: run the API tests through `npm test`, which makes a fresh test database');
  const { db } = openDatabase(url, 1);
  try {
    await migrate(db, join(repoRoot(), 'sql'));
  } finally {
    await db.destroy();
  }
}
