// Part of the demo seed: when `npm start` runs the local fake push service, Theo gets a "phone"
// there, so the demo's first alert also arrives as a push (listed on /dev/mail). A real browser's
// subscription goes to its vendor's push service instead, which this machine cannot reach.
import { readFileSync } from 'node:fs';
import type { Database } from '../db/database.js';
import type { FakePushDevice } from '../dev/fake-push.js';
import { httpsJson } from '../dev/https-json.js';

export const DEMO_DEVICE_LABEL = 'Demo phone (the local fake push service)';

/** Asks the fake service for a device and subscribes `accountId` with it; answers false when not running. */
export async function registerDemoPushDevice(db: Database, accountId: string, env = process.env): Promise<boolean> {
  const url = env.FAKE_PUSH_URL;
  const caFile = env.PUSH_CA_FILE;
  if (!url || !caFile) return false;
  const device = await newDevice(url, readFileSync(caFile, 'utf8'));
  await db
    .insertInto('pushSubscription')
    .values({
      accountId,
      endpoint: device.endpoint,
      p256dh: device.keys.p256dh,
      auth: device.keys.auth,
      label: DEMO_DEVICE_LABEL,
    })
    .execute();
  return true;
}

async function newDevice(url: string, ca: string): Promise<FakePushDevice> {
  const res = await httpsJson<FakePushDevice>(`${url}/subscriptions`, ca, 'POST');
  if (res.status !== 201) throw new Error(`fake push service answered ${res.status}`);
  return res.body;
}
