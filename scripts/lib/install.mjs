// Installs what a fresh machine lacks: node_modules (npm ci), PostgreSQL's server and Chromium
// (Debian packages, only when we are root; otherwise we name the package and stop).
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { capture, fail, isRoot, log, run } from './run.mjs';

export function ensureNodeModules(root) {
  const lock = join(root, 'package-lock.json');
  // npm writes node_modules/.package-lock.json at the end of every install: its age tells whether
  // the tree was installed from the current lock file.
  const installed = join(root, 'node_modules', '.package-lock.json');
  if (existsSync(installed) && statSync(installed).mtimeMs >= statSync(lock).mtimeMs) return;
  log('installing dependencies (npm ci)…');
  run('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root });
}

let aptUpdated = false;
function aptInstall(packages) {
  if (!aptUpdated) {
    run('apt-get', ['update', '-qq']);
    aptUpdated = true;
  }
  run('apt-get', ['install', '-y', '-qq', ...packages], {
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
}

/** The bin folder of the newest PostgreSQL server Debian installed, or null. */
function findPgBin() {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base)
    .filter((v) => existsSync(join(base, v, 'bin', 'initdb')) && existsSync(join(base, v, 'bin', 'pg_ctl')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? join(base, versions[0], 'bin') : null;
}

export function ensurePostgres() {
  let bin = findPgBin();
  if (bin) return bin;
  if (!isRoot) {
    fail('PostgreSQL server binaries not found. Install the Debian package "postgresql" (or set DATABASE_URL).');
  }
  log('installing PostgreSQL from Debian packages…');
  aptInstall(['postgresql']);
  bin = findPgBin();
  if (!bin) fail('apt-get installed "postgresql" but no server binaries were found under /usr/lib/postgresql.');
  return bin;
}

export const CHROMIUM = '/usr/bin/chromium';

export function ensureChromium() {
  if (existsSync(CHROMIUM)) return CHROMIUM;
  if (!isRoot) fail('Chromium not found at /usr/bin/chromium. Install the Debian package "chromium".');
  log('installing Chromium from Debian packages (for the browser tests)…');
  aptInstall(['chromium']);
  if (!existsSync(CHROMIUM)) fail('apt-get installed "chromium" but /usr/bin/chromium is missing.');
  return CHROMIUM;
}

export function postgresUserExists() {
  return capture('id', ['-u', 'postgres']) !== null;
}
