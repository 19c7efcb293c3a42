// HTTP load with autocannon against the running built API (and the bare baseline), on loopback.
// Each measurement runs a short warm-up first and throws it away.
import { randomUUID } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import autocannon from 'autocannon';

/** A valid feeding, as the web's Log feeding form sends it (fedAt left out: now). */
export const FEEDING_BODY = JSON.stringify({
  starterG: 25,
  flourG: 50,
  waterG: 50,
  flour: 'bread flour',
  waterTemperatureC: 26,
  temperatureC: 23.5,
  initialHeightMm: 42,
  observations: ['bubbles'],
});

function once(options) {
  return new Promise((resolve, reject) => {
    autocannon(options, (error, result) => (error ? reject(error) : resolve(result)));
  });
}

/**
 * One measurement. `request` is an autocannon request object (method, body, setupRequest…);
 * `paths` are taken in turn by the request's setupRequest when it sets none itself.
 */
export async function measure({ label, baseUrl, connections, seconds, headers = {}, request, beforeRun }) {
  const options = { url: baseUrl, connections, timeout: 30, headers, requests: [request] };
  await beforeRun?.(options);
  const r = await once({ ...options, duration: seconds });
  // autocannon's latencies count answered requests only. Each connection has one request out at
  // a time, so a connection that got no answer in the whole run waited at least the run's length;
  // when those are more than 1 % of the requests, p97.5 / p99 / max are at least the run's length.
  const unfinished = Math.max(0, r.requests.sent - r.requests.total);
  const neverAnswered = Math.max(0, connections - r.requests.total);
  const censored = neverAnswered > 0.01 * (r.requests.total + neverAnswered);
  const atLeast = (ms) => (censored ? Math.max(ms, seconds * 1000) : ms);
  return {
    label,
    connections,
    seconds,
    p50: r.requests.total ? r.latency.p50 : null,
    p97_5: r.requests.total || censored ? atLeast(r.latency.p97_5) : null,
    p99: r.requests.total || censored ? atLeast(r.latency.p99) : null,
    max: r.requests.total || censored ? atLeast(r.latency.max) : null,
    censored,
    rps: r.requests.average,
    requests: r.requests.total,
    unfinished,
    non2xx: r.non2xx,
    errors: r.errors,
    timeouts: r.timeouts,
  };
}

/** A short warm-up run whose numbers are thrown away (JIT, pool connections, caches). */
export function warmUp(seconds, connections) {
  return async (options) => {
    if (seconds > 0)
      await once({ ...options, connections: Math.min(options.connections, connections), duration: seconds });
  };
}

/**
 * One request at a time for about `seconds` (at least `min` requests): a slow route's own latency,
 * without queueing behind others. Throws on an unexpected status.
 */
export async function serial({ label, baseUrl, path, headers = {}, seconds, min = 2, post = null }) {
  const times = [];
  const until = Date.now() + seconds * 1000;
  while (times.length < min || Date.now() < until) {
    const started = performance.now();
    const response = await fetch(`${baseUrl}${path}`, {
      ...(post
        ? {
            method: 'POST',
            body: post,
            headers: { ...headers, 'content-type': 'application/json', 'idempotency-key': randomUUID() },
          }
        : { headers }),
    });
    await response.arrayBuffer();
    if (response.status !== (post ? 201 : 200)) throw new Error(`${path} answered ${response.status}`);
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  const at = (q) => Math.round(times[Math.min(times.length - 1, Math.ceil(q * times.length) - 1)]);
  const total = times.reduce((s, t) => s + t, 0);
  return {
    label,
    connections: 1,
    seconds: total / 1000,
    p50: at(0.5),
    p97_5: at(0.975),
    p99: at(0.99),
    max: Math.round(times[times.length - 1]),
    censored: false,
    rps: (1000 * times.length) / total,
    requests: times.length,
    unfinished: 0,
    non2xx: 0,
    errors: 0,
    timeouts: 0,
  };
}

/** Each request a fresh Idempotency-Key (the header every logbook POST carries) and the next culture. */
export function feedingRequest(cultureIds, { idempotencyKey }) {
  let next = 0;
  return {
    method: 'POST',
    body: FEEDING_BODY,
    setupRequest(req) {
      const id = cultureIds[next++ % cultureIds.length];
      const headers = { ...req.headers, 'content-type': 'application/json' };
      if (idempotencyKey) headers['idempotency-key'] = randomUUID();
      return { ...req, path: `/api/cultures/${id}/feedings`, headers };
    },
  };
}

export const getRequest = (path) => ({ method: 'GET', path });

/** Asks once and checks the answer, so a broken route fails loudly instead of being timed. */
export async function probe(baseUrl, path, { cookie, method = 'GET', body, expect = 200, headers = {} } = {}) {
  const response = await fetch(`${baseUrl}${path}`, {
    method,
    headers: { ...(cookie ? { cookie } : {}), ...(body ? { 'content-type': 'application/json' } : {}), ...headers },
    body,
  });
  const text = await response.text();
  if (response.status !== expect)
    throw new Error(`${method} ${path} answered ${response.status}: ${text.slice(0, 300)}`);
  return text;
}
