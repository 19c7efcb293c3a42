import { Inject, Injectable, type OnApplicationBootstrap } from '@nestjs/common';
import { sql } from 'kysely';
import { APP_CONFIG, type AppConfig } from '../config.js';
import { DATABASE } from './database.module.js';
import type { Database } from './database.js';

/** The settings that let PostgreSQL confirm a commit it could still lose in a crash. */
export async function durabilityProblems(db: Database): Promise<string[]> {
  const { rows } = await sql<{ name: string; setting: string }>`
    SELECT name, setting FROM pg_settings WHERE name IN ('fsync', 'synchronous_commit')`.execute(db);
  return rows.filter((r) => r.setting === 'off').map((r) => `${r.name} is off`);
}

/**
 * Refuses to start against a database that may lose confirmed writes: a baker's feeding that got
 * a 201 must survive a power cut. npm test's throw-away cluster runs without fsync for speed and
 * says so with ALLOW_UNSAFE_DURABILITY.
 */
@Injectable()
export class DurabilityCheck implements OnApplicationBootstrap {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (this.config.allowUnsafeDurability) return;
    const problems = await durabilityProblems(this.db);
    if (problems.length > 0) {
      throw new Error(
        `PostgreSQL ${problems.join(' and ')}: a crash could lose writes already confirmed. Turn it on, or set ALLOW_UNSAFE_DURABILITY=1 for a throw-away test database.`,
      );
    }
  }
}
