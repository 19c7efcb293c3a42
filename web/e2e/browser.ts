import { mkdtemp, mkdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext } from 'playwright-core';

export const PHONE = { width: 390, height: 844 } as const;
export const DESKTOP = { width: 1280, height: 800 } as const;

/** Screenshots land in web/test-results/ (git-ignored), for a person to look at. */
export const RESULTS_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', 'test-results');

/** The running Peakwise (API serving the built web app) the harness started for us. */
export function baseUrl(): string {
  const url = process.env.E2E_BASE_URL;
  if (!url) {
    throw new Error(
      'E2E_BASE_URL is not set. Start the API serving web/dist against a test database and set ' +
        'E2E_BASE_URL to its address (e.g. http://127.0.0.1:3000), or run the root `npm test`.',
    );
  }
  return url.replace(/\/+$/, '');
}

export interface Browser {
  context: BrowserContext;
  close: () => Promise<void>;
}

/** Debian's Chromium, headless, with a throwaway profile and no background network chatter. */
export async function launchBrowser(viewport: { width: number; height: number }): Promise<Browser> {
  const profile = await mkdtemp(join(tmpdir(), 'peakwise-e2e-'));
  await mkdir(RESULTS_DIR, { recursive: true });
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    context,
    close: async () => {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

/** An e-mail no other test run has used, so tests never depend on seed data. */
export function uniqueEmail(label: string): string {
  const stamp = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}`;
  return `${label}-${stamp}@example.test`;
}
