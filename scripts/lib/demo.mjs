import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

/** The demo sign-ins that the seed wrote (api/src/cli/seed.ts), or [] before the first seed. */
export function readDemoAccounts(dataDir) {
  const file = join(dataDir, 'demo-accounts.json');
  if (!existsSync(file)) return [];
  return JSON.parse(readFileSync(file, 'utf8'));
}
