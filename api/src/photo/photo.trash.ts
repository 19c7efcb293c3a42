import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config.js';
import { PhotoRepository } from './photo.repository.js';
import { PhotoStorage } from './photo.storage.js';

const HOUR_MS = 3_600_000;
const BATCH = 1000;

/**
 * Deletion that deletes. Whatever removes a photo row — the photo itself, its feeding, rise check,
 * bake plan, culture or account (cascades) — the row's trigger puts its two object keys in
 * photo_object_trash inside the same transaction. Services that delete call empty() once their
 * delete has committed, so the objects go before the response; whatever fails then (the store
 * unreachable, the process stopped) stays in the trash for the sweep at start and every hour,
 * which also removes objects no row names (an upload that died between the bucket and the insert).
 */
@Injectable()
export class PhotoTrash implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(PhotoTrash.name);
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;

  constructor(
    private readonly photos: PhotoRepository,
    private readonly storage: PhotoStorage,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Removes the trashed objects from the bucket. Never throws: what fails waits for the sweep. */
  async empty(): Promise<void> {
    if (!this.storage.configured) return;
    try {
      for (;;) {
        const keys = await this.photos.trashedKeys(BATCH);
        if (!keys.length) return;
        const failed = new Set(await this.storage.remove(keys));
        await this.photos.forgetTrashed(keys.filter((k) => !failed.has(k)));
        if (failed.size) {
          this.logger.warn(`${failed.size} photo objects could not be removed; the sweep will try again`);
          return;
        }
      }
    } catch (error) {
      this.logger.warn(`emptying the photo trash failed: ${(error as Error).message}`);
    }
  }

  /**
   * Empties the trash, then removes objects that no photo row names and that are older than
   * `graceMs` (younger ones may belong to an upload that has not inserted its rows yet).
   * Answers how many orphans it removed.
   */
  async sweep(graceMs = HOUR_MS): Promise<number> {
    await this.empty();
    let removed = 0;
    const cutoff = Date.now() - graceMs;
    for await (const page of this.storage.list()) {
      const inUse = await this.photos.keysInUse(page.map((o) => o.key));
      const orphans = page
        .filter((o) => !inUse.has(o.key) && (o.lastModified?.getTime() ?? 0) <= cutoff)
        .map((o) => o.key);
      const failed = await this.storage.remove(orphans);
      removed += orphans.length - failed.length;
    }
    if (removed) this.logger.log(`removed ${removed} photo objects no photo named`);
    return removed;
  }

  onApplicationBootstrap(): void {
    if (!this.storage.configured || !this.config.storage?.sweep) return;
    const run = () => {
      if (this.running) return;
      this.running = this.sweep()
        .then(() => undefined)
        .catch((error: Error) => this.logger.warn(`photo sweep failed: ${error.message}`))
        .finally(() => (this.running = null));
    };
    run();
    this.timer = setInterval(run, HOUR_MS).unref();
  }

  async onModuleDestroy(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    // The database closes after the modules: let a sweep under way finish first.
    await this.running;
  }
}
