#!/usr/bin/env node
// `npm test`: the same bootstrap as `npm start`, then a fresh throw-away PostgreSQL cluster (never
// the demo data), then every check in turn: type-check + lint, unit tests, API tests against the
// real database, the database-types drift check, and browser tests in Debian's Chromium against
// the built app. Prints a summary and exits non-zero on any failure.
//
// Run parts:  npm test -- unit | api | e2e | check   (several may be given; default: all)
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureChromium, ensureNodeModules, ensurePostgres } from './lib/install.mjs';
import { LocalCluster, clusterParent } from './lib/postgres.mjs';
import { startFakeMail } from './lib/fake-mail.mjs';
import { startFakePush } from './lib/fake-push.mjs';
import { startFakeS3 } from './lib/fake-s3.mjs';
import { apiEntry, cliEntry, ensureDataDir, root, webDist } from './lib/project.mjs';
import { log, runAsync } from './lib/run.mjs';

const PARTS = ['check', 'unit', 'api', 'e2e'];
const asked = process.argv.slice(2).filter((a) => PARTS.includes(a));
const unknown = process.argv.slice(2).filter((a) => !PARTS.includes(a));
if (unknown.length) {
  process.stderr.write(`unknown part(s): ${unknown.join(', ')}; choose from ${PARTS.join(', ')}\n`);
  process.exit(2);
}
const want = new Set(asked.length ? asked : PARTS);

ensureNodeModules(root);
ensureDataDir();
if (want.has('e2e')) ensureChromium();

const vitestBin = join(root, 'node_modules', 'vitest', 'vitest.mjs');
const reports = join(root, '.data', 'test-reports');
rmSync(reports, { recursive: true, force: true });
mkdirSync(reports, { recursive: true });

const results = [];
let cluster = null;
let server = null;
let fakeMail = null;
let fakePush = null;
let fakeS3 = null;

async function step(name, fn) {
  const started = Date.now();
  log(`── ${name}`);
  let ok = false;
  let counts = null;
  try {
    const outcome = await fn();
    ok = outcome.ok;
    counts = outcome.counts ?? null;
  } catch (error) {
    process.stderr.write(`[peakwise] ${name}: ${error.message}\n`);
  }
  results.push({ name, ok, counts, seconds: (Date.now() - started) / 1000 });
  return ok;
}

async function command(cmd, args, options = {}) {
  const code = await runAsync(cmd, args, { cwd: root, ...options });
  return { ok: code === 0 };
}

/** Runs vitest in a workspace and reads its JSON report for the pass/fail counts. */
async function vitest(name, cwd, extraArgs = [], env = {}) {
  const report = join(reports, `${name}.json`);
  const code = await runAsync(
    'node',
    [vitestBin, 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...extraArgs],
    { cwd: join(root, cwd), env: { ...process.env, ...env } },
  );
  let counts = null;
  if (existsSync(report)) {
    const json = JSON.parse(readFileSync(report, 'utf8'));
    counts = {
      passed: json.numPassedTests,
      failed: json.numFailedTests,
      skipped: json.numPendingTests + json.numTodoTests,
    };
    if (json.numTotalTests === 0) return { ok: false, counts };
  }
  return { ok: code === 0, counts };
}

async function startTestDatabase() {
  if (process.env.TEST_DATABASE_URL) {
    log('TEST_DATABASE_URL is set: tests will use (and wipe) that database');
    return process.env.TEST_DATABASE_URL;
  }
  const parent = clusterParent(root);
  cluster = new LocalCluster({
    bin: ensurePostgres(),
    dir: join(parent, 'pg-test'),
    secretsFile: join(parent, 'pg-test-secret.json'),
    port: Number(process.env.PGTESTPORT ?? 54339),
    fast: true,
  });
  if (cluster.isRunning()) {
    cluster.started = true;
    cluster.stop();
  }
  cluster.destroy();
  rmSync(cluster.secretsFile, { force: true });
  cluster.init();
  await cluster.start();
  cluster.ensureDatabase('peakwise_test');
  return cluster.url('peakwise_test');
}

function startServer(databaseUrl, port, mail, push, s3) {
  return new Promise((resolve, reject) => {
    server = spawn('node', [apiEntry], {
      cwd: root,
      stdio: ['ignore', 'ignore', 'inherit'],
      env: {
        ...process.env,
        DATABASE_URL: databaseUrl,
        PORT: String(port),
        HOST: '127.0.0.1',
        SESSION_SECRET: 'test-only-secret-test-only-secret-0123456789',
        WEB_DIST: webDist,
        LOG_LEVEL: 'warn',
        // Browser tests sign in many times from one address; api/test/throttle.api.test.ts covers the brake.
        AUTH_ATTEMPTS_PER_MINUTE: '1000',
        SMTP_URL: mail.smtpUrl,
        DEV_MAIL_URL: mail.httpUrl,
        PUSH_CA_FILE: push.certFile,
        DEV_PUSH_URL: push.url,
        ...s3.env,
        NODE_ENV: 'test',
        // The throw-away test cluster runs without fsync for speed (api/src/db/durability.ts).
        ALLOW_UNSAFE_DURABILITY: '1',
      },
    });
    server.once('error', reject);
    server.once('exit', (code) => reject(new Error(`the API exited early (${code})`)));
    const deadline = Date.now() + 30_000;
    const poll = async () => {
      try {
        if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return resolve();
      } catch {
        // not up yet
      }
      if (Date.now() > deadline) return reject(new Error('the API did not become healthy within 30 s'));
      setTimeout(poll, 200);
    };
    void poll();
  });
}

function cleanUp() {
  if (server && server.exitCode === null) {
    server.removeAllListeners('exit');
    server.kill('SIGTERM');
  }
  if (fakeMail && fakeMail.child.exitCode === null) fakeMail.child.kill('SIGTERM');
  if (fakePush && fakePush.child.exitCode === null) fakePush.child.kill('SIGTERM');
  if (fakeS3 && fakeS3.child.exitCode === null) fakeS3.child.kill('SIGTERM');
  cluster?.stop();
}
process.on('SIGINT', () => {
  cleanUp();
  process.exit(130);
});
process.on('SIGTERM', () => {
  cleanUp();
  process.exit(143);
});

const totalStart = Date.now();
try {
  if (want.has('check')) await step('check: type-check, lint, format', () => command('npm', ['run', '-s', 'check']));
  if (want.has('unit')) {
    await step('unit: shared', () => vitest('shared', 'shared'));
    await step('unit: web', () => vitest('web', 'web'));
  }
  if (want.has('api') || want.has('e2e')) {
    const databaseUrl = await startTestDatabase();
    const env = { ...process.env, DATABASE_URL: databaseUrl };
    const built = await step('build: shared, api, web', () => command('npm', ['run', '-s', 'build']));
    if (built) {
      await step('database: migrations apply to an empty database', () =>
        command('node', [cliEntry('migrate')], { env }),
      );
      await step('database: committed types match sql/', () =>
        command('node', [join(root, 'node_modules', 'kysely-codegen', 'dist', 'cli', 'bin.js'), '--verify'], {
          cwd: join(root, 'api'),
          env,
        }),
      );
    }
    if (want.has('api'))
      await step('api: NestJS against PostgreSQL', () => vitest('api', 'api', [], { DATABASE_URL: databaseUrl }));
    if (want.has('e2e') && built) {
      const port = Number(process.env.E2E_PORT ?? 3999);
      await step('e2e: browser (Chromium, playwright-core)', async () => {
        // Its own ports, so a running `npm start` (2525–2527) is not disturbed; mail and push in memory only.
        const smtpPort = Number(process.env.E2E_SMTP_PORT ?? 2535);
        fakeMail = await startFakeMail({ smtpPort, httpPort: smtpPort + 1, file: null, quiet: true });
        fakePush = await startFakePush({
          port: smtpPort + 2,
          certFile: join(root, '.data', 'fake-push-test-cert.pem'),
          file: null,
          quiet: true,
        });
        const s3Dir = join(root, '.data', 'fake-s3-test');
        rmSync(s3Dir, { recursive: true, force: true });
        fakeS3 = await startFakeS3({ port: smtpPort + 3, directory: s3Dir, quiet: true });
        await startServer(databaseUrl, port, fakeMail, fakePush, fakeS3);
        // DATABASE_URL: a few browser tests set up what no route offers (e.g. an instructor role).
        return vitest('e2e', 'web', ['--config', 'vitest.e2e.config.ts'], {
          E2E_BASE_URL: `http://127.0.0.1:${port}`,
          DATABASE_URL: databaseUrl,
        });
      });
    }
  }
} finally {
  cleanUp();
}

const width = Math.max(...results.map((r) => r.name.length));
const lines = ['', 'Summary', '-------'];
let passed = 0;
let failed = 0;
for (const r of results) {
  const counts = r.counts ? `${r.counts.passed} passed, ${r.counts.failed} failed` : '';
  lines.push(`${r.ok ? 'ok  ' : 'FAIL'}  ${r.name.padEnd(width)}  ${r.seconds.toFixed(1).padStart(6)} s  ${counts}`);
  if (r.counts) {
    passed += r.counts.passed;
    failed += r.counts.failed;
  } else if (!r.ok) {
    failed += 1;
  }
}
const allOk = results.length > 0 && results.every((r) => r.ok);
lines.push('', `total time ${((Date.now() - totalStart) / 1000).toFixed(0)} s${allOk ? '' : ' — some steps failed'}`);
// A step without its own test count (check, build) counts as one test when it fails.
lines.push(`tests: ${passed} passed, ${failed} failed`);
process.stdout.write(lines.join('\n') + '\n');
process.exit(allOk ? 0 : 1);
