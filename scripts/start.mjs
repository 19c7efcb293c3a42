#!/usr/bin/env node
// `npm start`: installs what is missing, starts a project-local PostgreSQL (unless DATABASE_URL is
// set), applies migrations, seeds the demo scenario into an empty database, builds, and serves the
// API and the web app from one port. Ctrl-C stops everything this script started.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { ensureNodeModules, ensurePostgres } from './lib/install.mjs';
import { LocalCluster, clusterParent } from './lib/postgres.mjs';
import {
  apiEntry,
  buildIfStale,
  cliEntry,
  dataDir,
  ensureDataDir,
  persistentSecret,
  root,
  webDist,
} from './lib/project.mjs';
import { readDemoAccounts } from './lib/demo.mjs';
import { startFakeMail } from './lib/fake-mail.mjs';
import { startFakePush } from './lib/fake-push.mjs';
import { startFakeS3 } from './lib/fake-s3.mjs';
import { fail, log, run } from './lib/run.mjs';

const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? '127.0.0.1';
const pgPort = Number(process.env.PGPORT ?? 54329);

ensureNodeModules(root);
ensureDataDir();

let cluster = null;
let databaseUrl = process.env.DATABASE_URL;
if (!databaseUrl) {
  const parent = clusterParent(root);
  cluster = new LocalCluster({
    bin: ensurePostgres(),
    dir: join(parent, 'pg'),
    secretsFile: join(parent, 'pg-secret.json'),
    port: pgPort,
  });
  cluster.init();
  await cluster.start();
  cluster.ensureDatabase('peakwise');
  databaseUrl = cluster.url('peakwise');
  log(`PostgreSQL on 127.0.0.1:${pgPort} (data in ${cluster.dir})`);
} else {
  log('DATABASE_URL is set: using that database, starting no local PostgreSQL');
}

let api = null;
// The local fake mail server and push service, unless SMTP_URL names a real mail server.
let fakeMail = null;
let fakePush = null;
let fakeS3 = null;
let stopping = false;
function stopAll(code) {
  if (stopping) return;
  stopping = true;
  const finish = async () => {
    await Promise.all([fakeMail?.stop(), fakePush?.stop(), fakeS3?.stop()]);
    cluster?.stop();
    log(code === 0 ? 'stopped' : `stopped (exit ${code})`);
    process.exit(code);
  };
  if (api && api.exitCode === null) {
    api.once('exit', finish);
    api.kill('SIGTERM');
    setTimeout(() => api.kill('SIGKILL'), 10_000).unref();
  } else {
    finish();
  }
}
process.on('SIGINT', () => stopAll(0));
process.on('SIGTERM', () => stopAll(0));

try {
  buildIfStale();
} catch (error) {
  process.stderr.write(`[peakwise] ${error.message}\n`);
  stopAll(1);
}

// The local stand-ins for hosted services, unless a real one is named: started before the seed,
// which gives a demo baker a device on the fake push service.
if (!stopping && !process.env.SMTP_URL) {
  try {
    fakeMail = await startFakeMail({
      smtpPort: Number(process.env.FAKE_SMTP_PORT ?? 2525),
      httpPort: Number(process.env.FAKE_SMTP_HTTP_PORT ?? 2526),
      file: join(dataDir, 'fake-mail.json'),
      quiet: true,
    });
    fakePush = await startFakePush({
      port: Number(process.env.FAKE_PUSH_PORT ?? 2527),
      certFile: join(dataDir, 'fake-push-cert.pem'),
      file: join(dataDir, 'fake-push.json'),
      quiet: true,
    });
  } catch (error) {
    process.stderr.write(`[peakwise] ${error.message}\n`);
    stopAll(1);
  }
}
// Photos go to a local fake S3 unless S3_ENDPOINT names a real store.
if (!stopping && !process.env.S3_ENDPOINT) {
  try {
    fakeS3 = await startFakeS3({
      port: Number(process.env.FAKE_S3_PORT ?? 2528),
      directory: join(dataDir, 'fake-s3'),
      quiet: true,
    });
  } catch (error) {
    process.stderr.write(`[peakwise] ${error.message}\n`);
    stopAll(1);
  }
}
const fakeEnv = {
  ...(fakeS3 ? fakeS3.env : {}),
  ...(fakeMail ? { SMTP_URL: fakeMail.smtpUrl, DEV_MAIL_URL: fakeMail.httpUrl } : {}),
  ...(fakePush ? { FAKE_PUSH_URL: fakePush.url, DEV_PUSH_URL: fakePush.url, PUSH_CA_FILE: fakePush.certFile } : {}),
};

if (!stopping) {
  try {
    const env = { ...process.env, DATABASE_URL: databaseUrl, PEAKWISE_DATA_DIR: dataDir, ...fakeEnv };
    run('node', [cliEntry('migrate')], { env });
    run('node', [cliEntry('seed')], { env });
  } catch (error) {
    process.stderr.write(`[peakwise] ${error.message}\n`);
    stopAll(1);
  }
}

if (!stopping) {
  api = spawn('node', [apiEntry], {
    stdio: 'inherit',
    env: {
      ...process.env,
      DATABASE_URL: databaseUrl,
      PORT: String(port),
      HOST: host,
      SESSION_SECRET: process.env.SESSION_SECRET ?? persistentSecret('session'),
      WEB_DIST: webDist,
      // Warnings and errors only, so the banner and what matters stay readable; LOG_LEVEL=info for every request.
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
      ...fakeEnv,
      // With the fake mail server this is a local trial, not production: its mail page stays on.
      NODE_ENV: process.env.NODE_ENV ?? (fakeMail ? 'development' : 'production'),
    },
  });
  api.on('exit', (code) => {
    if (!stopping) {
      process.stderr.write(`[peakwise] the API stopped (exit ${code}); shutting down\n`);
      stopAll(code || 1);
    }
  });
  api.on('error', (error) => fail(`could not start the API: ${error.message}`));
  await waitForHealth(`http://${host}:${port}/api/health`);
  if (!stopping) printBanner(`http://${host}:${port}`, fakeMail !== null);
}

async function waitForHealth(url) {
  for (let i = 0; i < 120 && !stopping; i++) {
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

function printBanner(url, withFakeMail) {
  const lines = ['', `Peakwise is running at ${url}`, ''];
  if (withFakeMail) {
    lines.push(
      `Mail and push notifications sent by Peakwise (local fake services; nothing leaves this machine): ${url}/dev/mail`,
      '',
    );
  }
  const accounts = readDemoAccounts(dataDir);
  if (accounts.length) {
    lines.push('Demo sign-ins (the Larkspur Community Kitchen class):');
    for (const a of accounts)
      lines.push(`  ${a.role.padEnd(10)} ${a.email.padEnd(34)} ${a.password ?? '(password set earlier)'}`);
    lines.push('');
  }
  lines.push('Press Ctrl-C to stop (PostgreSQL stops too; your data is kept for the next start).', '');
  process.stdout.write(lines.join('\n') + '\n');
}
