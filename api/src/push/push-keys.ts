import { Inject, Injectable } from '@nestjs/common';
import webpush from 'web-push';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

export interface VapidKeys {
  publicKey: string;
  privateKey: string;
}

const VAPID_SECRET = 'vapid';

/**
 * The server's VAPID key pair (RFC 8292), made on first use and kept in app_secret, so every API
 * process signs with the same key and the browsers' subscriptions (made with its public half)
 * survive restarts. Two processes starting at once both try to insert; the first insert wins and
 * both read back the same row.
 */
@Injectable()
export class PushKeys {
  private loaded: Promise<VapidKeys> | null = null;

  constructor(@Inject(DATABASE) private readonly db: Database) {}

  keys(): Promise<VapidKeys> {
    // A failed load (database down) is not remembered: the next call tries again.
    this.loaded ??= this.load().catch((error: unknown) => {
      this.loaded = null;
      throw error;
    });
    return this.loaded;
  }

  private async load(): Promise<VapidKeys> {
    const fresh = webpush.generateVAPIDKeys();
    await this.db
      .insertInto('appSecret')
      .values({ name: VAPID_SECRET, value: JSON.stringify(fresh) })
      .onConflict((oc) => oc.column('name').doNothing())
      .execute();
    const row = await this.db
      .selectFrom('appSecret')
      .select('value')
      .where('name', '=', VAPID_SECRET)
      .executeTakeFirstOrThrow();
    return row.value as unknown as VapidKeys;
  }
}
