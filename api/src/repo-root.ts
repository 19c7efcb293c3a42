import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * The repository's top folder, found by walking up from this file. The API runs both from
 * `api/src` (tests) and from `api/dist/src` (built), so a fixed relative path would be wrong once.
 */
export function repoRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    if (existsSync(join(dir, 'sql')) && existsSync(join(dir, 'package-lock.json'))) return dir;
    const parent = dirname(dir);
    if (parent === dir) throw new Error('cannot find the repository root (a folder with sql/)');
    dir = parent;
  }
}
