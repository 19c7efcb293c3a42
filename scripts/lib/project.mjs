// Shared steps of `npm start` and `npm test`: where things live, building, secrets.
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { log, run } from './run.mjs';

export const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
export const dataDir = join(root, '.data');

export function ensureDataDir() {
  // Not 0700: as root, the postgres user must be able to pass through to .data/pg.
  mkdirSync(dataDir, { recursive: true });
  return dataDir;
}

/** A random secret kept in .data so it survives restarts (sessions stay valid across runs). */
export function persistentSecret(name) {
  const file = join(ensureDataDir(), 'secrets.json');
  const secrets = existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : {};
  if (!secrets[name]) {
    secrets[name] = randomBytes(32).toString('base64url');
    writeFileSync(file, JSON.stringify(secrets, null, 2) + '\n', { mode: 0o600 });
  }
  return secrets[name];
}

function newestMtime(path) {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(path)) {
    if (entry === 'node_modules' || entry === 'dist' || entry === 'test-results') continue;
    newest = Math.max(newest, newestMtime(join(path, entry)));
  }
  return newest;
}

const buildInputs = ['shared', 'api', 'web', 'package-lock.json', 'tsconfig.base.json'].map((p) => join(root, p));
const buildStamp = join(root, 'api', 'dist', '.build-stamp');

/** Builds shared, api and web unless the last build is newer than every source file. */
export function buildIfStale() {
  const newestSource = Math.max(...buildInputs.map(newestMtime));
  if (existsSync(buildStamp) && statSync(buildStamp).mtimeMs >= newestSource) return;
  log('building shared, api and web…');
  run('npm', ['run', '-s', 'build'], { cwd: root });
  writeFileSync(buildStamp, new Date().toISOString() + '\n');
}

export const apiEntry = join(root, 'api', 'dist', 'src', 'main.js');
export const cliEntry = (name) => join(root, 'api', 'dist', 'src', 'cli', `${name}.js`);
export const webDist = join(root, 'web', 'dist');
