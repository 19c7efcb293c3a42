// Lighthouse 12.2.3's mobile performance score (its default config: a mid-range phone on slow 4G,
// simulated throttling) with Debian's Chromium, headless. Signed-in pages get the session cookie
// through extraHeaders, so every request of the page load carries it.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const FLAGS = [
  '--headless=new',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  // Without these Chromium floods a closed network with update and sync requests.
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

const METRICS = {
  fcpMs: 'first-contentful-paint',
  lcpMs: 'largest-contentful-paint',
  tbtMs: 'total-blocking-time',
  cls: 'cumulative-layout-shift',
  siMs: 'speed-index',
};

/** pages: [{ label, url, cookie? }] → [{ label, url, score (0–100), metrics }] */
export async function lighthouseScores(chromePath, pages) {
  const { default: lighthouse } = await import('lighthouse');
  const chromeLauncher = await import('chrome-launcher');
  const results = [];
  for (const page of pages) {
    // A fresh browser and profile per page: nothing cached from the page before.
    const profile = mkdtempSync(join(tmpdir(), 'peakwise-lh-'));
    const chrome = await chromeLauncher.launch({
      chromePath,
      chromeFlags: FLAGS,
      userDataDir: profile,
      logLevel: 'silent',
    });
    try {
      const runnerResult = await lighthouse(page.url, {
        port: chrome.port,
        output: 'json',
        logLevel: 'error',
        onlyCategories: ['performance'],
        ...(page.cookie ? { extraHeaders: { Cookie: page.cookie } } : {}),
      });
      const lhr = runnerResult?.lhr;
      if (!lhr) throw new Error(`Lighthouse returned nothing for ${page.url}`);
      const metrics = Object.fromEntries(
        Object.entries(METRICS).map(([key, audit]) => [key, lhr.audits[audit]?.numericValue ?? null]),
      );
      results.push({
        label: page.label,
        url: page.url,
        finalUrl: lhr.finalDisplayedUrl,
        score: lhr.categories.performance.score === null ? null : Math.round(lhr.categories.performance.score * 100),
        benchmarkIndex: lhr.environment?.benchmarkIndex ?? null,
        runtimeError: lhr.runtimeError?.message ?? null,
        metrics,
      });
    } finally {
      await chrome.kill();
      rmSync(profile, { recursive: true, force: true });
    }
  }
  return results;
}
