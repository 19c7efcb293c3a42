// The bench's own world: a durable PostgreSQL cluster of its own (.data/pg-bench), the built API
// on it (with the fake mail server, as `npm start` runs it), and a fresh database each run so every
// run measures the same data.
import { randomBytes } from 'node:crypto';
import { spawn } from 'node:child_process';
import { createWriteStream, existsSync, mkdirSync } from 'node:fs';
import { connect } from 'node:net';
import { join, resolve } from 'node:path';
import { stopChild, waitForChild } from '../lib/child.mjs';
import { ensurePostgres } from '../lib/install.mjs';
import { LocalCluster, clusterParent } from '../lib/postgres.mjs';
import { buildIfStale, dataDir, root, webDist as defaultWebDist } from '../lib/project.mjs';
import { fail, log, run } from '../lib/run.mjs';

export const DATABASE = 'peakwise_bench';
export const benchDir = join(dataDir, 'bench');

const envPort = (name, fallback) => Number(process.env[name] ?? fallback);
export const ports = {
  pg: envPort('BENCH_PGPORT', 54341),
  api: envPort('BENCH_PORT', 3341),
  bare: envPort('BENCH_BARE_PORT', 3342),
  smtp: envPort('BENCH_SMTP_PORT', 3343),
  smtpHttp: envPort('BENCH_SMTP_HTTP_PORT', 3344),
};

/**
 * Where the built API and web app are. BENCH_API_DIST (the folder holding src/main.js) and
 * BENCH_WEB_DIST point the bench at another build; otherwise it builds like `npm start` does
 * (only when a source is newer than the last build).
 */
export function buildPaths() {
  const apiOverride = process.env.BENCH_API_DIST;
  const webOverride = process.env.BENCH_WEB_DIST;
  if (!apiOverride || !webOverride) buildIfStale();
  const apiDist = apiOverride ? resolve(root, apiOverride) : join(root, 'api', 'dist');
  const webDist = webOverride ? resolve(root, webOverride) : defaultWebDist;
  if (!existsSync(join(apiDist, 'src', 'main.js'))) fail(`no built API at ${apiDist}/src/main.js`);
  if (!existsSync(join(webDist, 'index.html'))) fail(`no built web app at ${webDist}/index.html`);
  return { apiDist, webDist };
}

function portFree(port) {
  return new Promise((resolvePort) => {
    const socket = connect({ host: '127.0.0.1', port });
    socket.once('connect', () => {
      socket.destroy();
      resolvePort(false);
    });
    socket.once('error', () => resolvePort(true));
  });
}

export async function requireFreePorts(list) {
  for (const [name, port] of list) {
    if (!(await portFree(port))) fail(`port ${port} (${name}) is taken; choose another (BENCH_* variables)`);
  }
}

/** The bench cluster, durable like the one `npm start` runs (no fsync=off): we measure what a baker gets. */
export async function startCluster() {
  const parent = clusterParent(root);
  const cluster = new LocalCluster({
    bin: ensurePostgres(),
    dir: join(parent, 'pg-bench'),
    secretsFile: join(parent, 'pg-bench-secret.json'),
    port: ports.pg,
  });
  cluster.init();
  await cluster.start();
  if (cluster.psql(`DROP DATABASE IF EXISTS ${DATABASE} WITH (FORCE)`) === null)
    fail('could not drop the bench database');
  cluster.ensureDatabase(DATABASE);
  return cluster;
}

export function migrate(apiDist, databaseUrl) {
  run('node', [join(apiDist, 'src', 'cli', 'migrate.js')], {
    cwd: root,
    stdio: ['ignore', 'ignore', 'inherit'],
    env: { ...process.env, DATABASE_URL: databaseUrl },
  });
}

async function waitForHealth(child, url, name) {
  const deadline = Date.now() + 90_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the ${name} exited early (${child.exitCode}); see ${benchDir}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  await stopChild(child);
  throw new Error(`the ${name} did not answer ${url} within 90 s`);
}

const opened = new Set();
/** .data/bench/<name>.log, emptied at the first start of a run; a restarted API appends. */
function logTo(name) {
  mkdirSync(benchDir, { recursive: true });
  const flags = opened.has(name) ? 'a' : 'w';
  opened.add(name);
  const stream = createWriteStream(join(benchDir, `${name}.log`), { flags });
  stream.write(`--- started ${new Date().toISOString()}\n`);
  return stream;
}

function pipeOut(child, stream) {
  child.stdout?.pipe(stream);
  child.stderr?.pipe(stream);
}

/** The fake mail server from the same build: alert e-mails have somewhere to go, as under `npm start`. */
export async function startFakeMail(apiDist) {
  const child = spawn('node', [join(apiDist, 'src', 'dev', 'fake-smtp.main.js')], {
    cwd: root,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...process.env,
      FAKE_SMTP_PORT: String(ports.smtp),
      FAKE_SMTP_HTTP_PORT: String(ports.smtpHttp),
      FAKE_SMTP_FILE: '',
    },
  });
  pipeOut(child, logTo('fake-mail'));
  await waitForChild(child, async () => (await fetch(`http://127.0.0.1:${ports.smtpHttp}/messages`)).ok, {
    name: 'fake mail server',
    ports: [ports.smtp, ports.smtpHttp],
  });
  return { smtpUrl: `smtp://127.0.0.1:${ports.smtp}`, stop: () => stopChild(child) };
}

/**
 * The built API as a baker runs it (NODE_ENV=production, warnings only). Two settings differ from
 * `npm start`, both only about signing in: the bench signs up 33 accounts, so the sign-in brake is
 * raised and scrypt's cost lowered to 2^14 (sign-ins are not measured).
 */
export async function startApi({ apiDist, webDist, databaseUrl, smtpUrl, sessionSecret }) {
  const child = spawn('node', [join(apiDist, 'src', 'main.js')], {
    cwd: root,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...process.env,
      NODE_ENV: 'production',
      DATABASE_URL: databaseUrl,
      HOST: '127.0.0.1',
      PORT: String(ports.api),
      SESSION_SECRET: sessionSecret,
      WEB_DIST: webDist,
      LOG_LEVEL: 'warn',
      SMTP_URL: smtpUrl,
      AUTH_ATTEMPTS_PER_MINUTE: '1000',
      PASSWORD_HASH_COST: '14',
    },
  });
  pipeOut(child, logTo('api'));
  const baseUrl = `http://127.0.0.1:${ports.api}`;
  await waitForHealth(child, `${baseUrl}/api/health`, 'API');
  return { baseUrl, pid: child.pid, stop: () => stopChild(child) };
}

/** One secret for every API process of a run, so a restarted API still knows the sign-ins. */
export const newSessionSecret = () => randomBytes(32).toString('base64url');

/**
 * Waits until the API answers its health check quickly three times running: an overloaded run
 * leaves requests queued that would still be eating CPU in the next measurement. False when it
 * has not settled within `seconds`.
 */
export async function settle(baseUrl, seconds = 20, quickMs = 100) {
  const deadline = Date.now() + seconds * 1000;
  let fast = 0;
  while (Date.now() < deadline) {
    const started = Date.now();
    try {
      const ok = (await fetch(`${baseUrl}/api/health`, { signal: AbortSignal.timeout(5000) })).ok;
      fast = ok && Date.now() - started < quickMs ? fast + 1 : 0;
    } catch {
      fast = 0;
    }
    if (fast >= 3) return true;
    await new Promise((r) => setTimeout(r, 200));
  }
  return false;
}

/** The bare Fastify + pg baseline (bare-server.mjs) as its own process, like the API. */
export async function startBare(databaseUrl) {
  const child = spawn('node', [join(root, 'scripts', 'bench', 'bare-server.mjs')], {
    cwd: root,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, DATABASE_URL: databaseUrl, PORT: String(ports.bare) },
  });
  pipeOut(child, logTo('bare'));
  const baseUrl = `http://127.0.0.1:${ports.bare}`;
  await waitForHealth(child, `${baseUrl}/health`, 'bare baseline server');
  return { baseUrl, stop: () => stopChild(child) };
}

export { log };
