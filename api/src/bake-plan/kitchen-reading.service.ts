import { Injectable, NotFoundException } from '@nestjs/common';
import {
  KITCHEN_READINGS_MAX_PER_PLAN,
  type CreateKitchenReadingsRequest,
  type KitchenReadingListResponse,
  type KitchenReadingsAdded,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { fieldError } from '../common/validation.js';
import { BakePlanRepository, type BakePlanRow } from './bake-plan.repository.js';
import { KitchenReadingRepository } from './kitchen-reading.repository.js';

/** A logger usually starts before the mix: a day ahead is room enough, and keeps old files out. */
const BEFORE_MIX_MS = 24 * 3_600_000;

/**
 * A plan's kitchen series (a logger's room temperatures). Any plan of the baker's takes one, a
 * finished one too: a logger file is often read out after the bake, and the record's timeline
 * then shows what the room did. The bulk forecast and the plan's alerts follow it.
 */
@Injectable()
export class KitchenReadingService {
  constructor(
    private readonly plans: BakePlanRepository,
    private readonly kitchen: KitchenReadingRepository,
    private readonly alerts: AlertScheduler,
  ) {}

  private async requireOwned(account: AccountRecord, planId: string): Promise<BakePlanRow> {
    const row = await this.plans.findOwned(account.id, planId);
    if (!row) throw new NotFoundException('No bake plan with this id.');
    return row;
  }

  async add(
    account: AccountRecord,
    planId: string,
    request: CreateKitchenReadingsRequest,
  ): Promise<KitchenReadingsAdded> {
    const row = await this.requireOwned(account, planId);
    const earliest = Date.parse(row.timing.mixAt) - BEFORE_MIX_MS;
    request.readings.forEach((r, i) => {
      if (Date.parse(r.takenAt) < earliest) {
        throw fieldError(
          `readings.${i}.takenAt`,
          'This is more than a day before the plan’s mix; choose readings from the bake.',
        );
      }
    });
    // Checked before the insert: two imports at once could pass it together, by one batch at most.
    const before = await this.kitchen.count(row.id);
    if (before + request.readings.length > KITCHEN_READINGS_MAX_PER_PLAN) {
      throw fieldError(
        'readings',
        `A bake keeps at most ${KITCHEN_READINGS_MAX_PER_PLAN} kitchen readings; it has ${before}. Thin the file or remove the old series first.`,
      );
    }
    const added = await this.kitchen.insertMany(row.id, request.readings);
    if (added > 0) await this.alerts.refreshPlan(row.id);
    return { added, total: before + added };
  }

  async list(account: AccountRecord, planId: string): Promise<KitchenReadingListResponse> {
    const row = await this.requireOwned(account, planId);
    const rows = await this.plans.kitchenReadings(row.id);
    return { items: rows.map((r) => ({ takenAt: r.takenAt.toISOString(), temperatureC: r.temperatureC })) };
  }

  async clear(account: AccountRecord, planId: string): Promise<void> {
    const row = await this.requireOwned(account, planId);
    await this.kitchen.deleteAll(row.id);
    await this.alerts.refreshPlan(row.id);
  }
}
