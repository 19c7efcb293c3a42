import { Injectable, NotFoundException } from '@nestjs/common';
import type {
  CreateRiseCheckRequest,
  RiseCheck,
  RiseCheckListResponse,
  UpdateRiseCheckRequest,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { requireNotBeforeFeeding } from '../feeding/feeding-time.js';
import { FeedingService } from '../feeding/feeding.service.js';
import { PhotoTrash } from '../photo/photo.trash.js';
import { toRiseCheck } from './rise-check.mapper.js';
import { RiseCheckRepository, type OwnedRiseCheck } from './rise-check.repository.js';
import { requestedHeightMm } from './rise-check.height.js';

@Injectable()
export class RiseCheckService {
  constructor(
    private readonly checks: RiseCheckRepository,
    private readonly feedings: FeedingService,
    private readonly alerts: AlertScheduler,
    private readonly photoTrash: PhotoTrash,
  ) {}

  private async requireOwned(account: AccountRecord, id: string): Promise<OwnedRiseCheck> {
    const row = await this.checks.findOwned(account.id, id);
    if (!row) throw new NotFoundException('No rise check with this id.');
    return row;
  }

  async create(
    account: AccountRecord,
    feedingId: string,
    request: CreateRiseCheckRequest,
    writeKey: string | null = null,
  ): Promise<RiseCheck> {
    const feeding = await this.feedings.requireOwned(account, feedingId);
    const takenAt = request.takenAt ?? new Date().toISOString();
    requireNotBeforeFeeding(feeding.fedAt, [{ field: 'takenAt', at: takenAt }]);
    const heightMm = requestedHeightMm(request, feeding.initialHeightMm);
    if (heightMm === undefined) throw new Error('CreateRiseCheckDto let a rise check through without a height');
    const row = await this.checks.insert({
      feedingId,
      takenAt,
      heightMm,
      temperatureC: request.temperatureC,
      idempotencyKey: writeKey,
    });
    await this.alerts.refreshCulture(feeding.cultureId);
    return toRiseCheck(row);
  }

  async list(
    account: AccountRecord,
    feedingId: string,
    page: { limit: number; offset: number },
  ): Promise<RiseCheckListResponse> {
    await this.feedings.requireOwned(account, feedingId);
    const { items, total } = await this.checks.list(feedingId, page);
    return { items: items.map(toRiseCheck), total, limit: page.limit, offset: page.offset };
  }

  async update(account: AccountRecord, id: string, request: UpdateRiseCheckRequest): Promise<RiseCheck> {
    const check = await this.requireOwned(account, id);
    if (request.takenAt !== undefined) {
      requireNotBeforeFeeding(check.fedAt, [{ field: 'takenAt', at: request.takenAt }]);
    }
    const row = await this.checks.update(id, {
      takenAt: request.takenAt,
      heightMm: requestedHeightMm(request, check.initialHeightMm),
      temperatureC: request.temperatureC,
    });
    await this.alerts.refreshFeeding(check.feedingId);
    return toRiseCheck(row);
  }

  async delete(account: AccountRecord, id: string): Promise<void> {
    const { feedingId } = await this.requireOwned(account, id);
    if (!(await this.checks.delete(account.id, id))) throw new NotFoundException('No rise check with this id.');
    await this.photoTrash.empty();
    await this.alerts.refreshFeeding(feedingId);
  }
}
