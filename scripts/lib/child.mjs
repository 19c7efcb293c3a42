// A helper process of `npm start` / `npm test` (a fake mail or push service): started, waited for
// until it answers, and stopped again.

/** Resolves once the child has gone (at once if it already has). */
export function stopChild(child) {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    child.once('exit', () => resolve());
    child.kill('SIGTERM');
    setTimeout(() => child.kill('SIGKILL'), 5_000).unref();
  });
}

/**
 * Polls `ready()` until it answers true; rejects if the child exits first or 15 s pass (then
 * stops it). `name` and `ports` make the message say what to check.
 */
export function waitForChild(child, ready, { name, ports }) {
  return new Promise((resolve, reject) => {
    let settled = false;
    const early = (code) => {
      if (settled) return;
      settled = true;
      reject(new Error(`the ${name} exited early (${code}); is port ${ports.join(' or ')} taken?`));
    };
    child.once('error', (error) => early(error.message));
    child.once('exit', early);
    const deadline = Date.now() + 15_000;
    const poll = async () => {
      if (settled) return;
      if (await ready().catch(() => false)) {
        settled = true;
        child.off('exit', early);
        return resolve();
      }
      if (Date.now() > deadline) {
        settled = true;
        void stopChild(child);
        return reject(new Error(`the ${name} did not answer within 15 s`));
      }
      setTimeout(poll, 150);
    };
    void poll();
  });
}
