// Small process helpers for the bootstrap scripts. Plain Node, no dependencies: these run before
// `npm ci` has installed anything.
import { spawn, spawnSync } from 'node:child_process';

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** Runs a command to completion, streaming its output; throws when it exits non-zero. */
export function run(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: 'inherit', ...options });
  if (result.error) throw result.error;
  if (result.status !== 0) {
    throw new Error(`${cmd} ${args.join(' ')} exited with ${result.status ?? result.signal}`);
  }
  return result;
}

/** Runs a command and returns its trimmed stdout, or null when it fails. */
export function capture(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { encoding: 'utf8', ...options });
  if (result.error || result.status !== 0) return null;
  return result.stdout.trim();
}

/** Runs a command asynchronously; resolves with its exit code (never rejects on non-zero). */
export function runAsync(cmd, args, options = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: 'inherit', ...options });
    child.on('error', reject);
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 128 : 1)));
  });
}

export function log(message) {
  process.stdout.write(`[peakwise] ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`[peakwise] ${message}\n`);
  process.exit(1);
}
