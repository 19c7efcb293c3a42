import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { IdempotencyRepository } from './idempotency.repository.js';

const HOUR_MS = 3_600_000;
const BATCH = 5000;

/**
 * Deletes expired keys of every account, at start and every hour. A claim also drops its own key
 * when expired, but keys of an account that never writes again would otherwise stay forever.
 * Several processes may sweep at once: each batch deletes what is still there.
 */
@Injectable()
export class IdempotencySweeper implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(IdempotencySweeper.name);
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<number> | null = null;

  constructor(private readonly keys: IdempotencyRepository) {}

  onApplicationBootstrap(): void {
    void this.sweepQuietly();
    this.timer = setInterval(() => void this.sweepQuietly(), HOUR_MS);
    this.timer.unref();
  }

  async onModuleDestroy(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.running?.catch(() => undefined);
  }

  /** Deletes every expired key; answers how many. One sweep at a time per process. */
  sweep(): Promise<number> {
    this.running ??= this.deleteAll().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  private async deleteAll(): Promise<number> {
    let total = 0;
    for (;;) {
      const deleted = await this.keys.deleteExpiredBatch(BATCH);
      total += deleted;
      if (deleted < BATCH) return total;
    }
  }

  private async sweepQuietly(): Promise<void> {
    try {
      const deleted = await this.sweep();
      if (deleted) this.logger.log(`${deleted} expired idempotency keys deleted`);
    } catch (error) {
      this.logger.warn(`sweeping expired idempotency keys failed: ${(error as Error).message}`);
    }
  }
}
