// `node api/dist/src/cli/migrate.js`: applies sql/ to DATABASE_URL. Used by npm start and npm test.
import { join } from 'node:path';
import { openDatabase } from '../db/database.js';
import { migrate } from '../db/migrator.js';
import { repoRoot } from '../repo-root.js';

const url = process.env.DATABASE_URL;
if (!url) {
  process.stderr.write('DATABASE_URL is not set\n');
  process.exit(2);
}
const { db } = openDatabase(url, 1);
try {
  const ran = await migrate(db, join(repoRoot(), 'sql'));
  process.stdout.write(ran.length ? `applied ${ran.join(', ')}\n` : 'database schema is up to date\n');
} finally {
  await db.destroy();
}
