import { Injectable, NotFoundException } from '@nestjs/common';
import type {
  CreateFeedingRequest,
  Feeding,
  FeedingListResponse,
  SortOrder,
  UpdateFeedingRequest,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { fieldError } from '../common/validation.js';
import { CultureService } from '../culture/culture.service.js';
import { PhotoTrash } from '../photo/photo.trash.js';
import { requestedGrams } from './feeding.amounts.js';
import { toFeeding } from './feeding.mapper.js';
import { FeedingRepository, type FeedingRow } from './feeding.repository.js';

@Injectable()
export class FeedingService {
  constructor(
    private readonly feedings: FeedingRepository,
    private readonly cultures: CultureService,
    private readonly alerts: AlertScheduler,
    private readonly photoTrash: PhotoTrash,
  ) {}

  /** The account's feeding, or 404 — also for another account's id. */
  async requireOwned(account: AccountRecord, id: string): Promise<FeedingRow> {
    const row = await this.feedings.findOwned(account.id, id);
    if (!row) throw new NotFoundException('No feeding with this id.');
    return row;
  }

  async create(
    account: AccountRecord,
    cultureId: string,
    request: CreateFeedingRequest,
    writeKey: string | null = null,
  ): Promise<Feeding> {
    await this.cultures.requireOwned(account, cultureId);
    const { starterG, flourG, waterG } = requestedGrams(request);
    if (starterG === undefined || flourG === undefined || waterG === undefined) {
      throw new Error('CreateFeedingDto let a feeding through without weights');
    }
    const row = await this.feedings.insert({
      cultureId,
      fedAt: request.fedAt ?? new Date(),
      starterG,
      flourG,
      waterG,
      flour: request.flour,
      waterTemperatureC: request.waterTemperatureC,
      temperatureC: request.temperatureC,
      initialHeightMm: request.initialHeightMm,
      notes: request.notes,
      observations: request.observations,
      idempotencyKey: writeKey,
    });
    await this.alerts.refreshCulture(cultureId);
    return toFeeding(row);
  }

  async list(
    account: AccountRecord,
    cultureId: string,
    page: { order?: SortOrder; limit: number; offset: number },
  ): Promise<FeedingListResponse> {
    await this.cultures.requireOwned(account, cultureId);
    const { items, total } = await this.feedings.list(cultureId, { ...page, order: page.order ?? 'desc' });
    return { items: items.map(toFeeding), total, limit: page.limit, offset: page.offset };
  }

  async get(account: AccountRecord, id: string): Promise<Feeding> {
    return toFeeding(await this.requireOwned(account, id));
  }

  async update(account: AccountRecord, id: string, request: UpdateFeedingRequest): Promise<Feeding> {
    await this.requireOwned(account, id);
    if (request.fedAt !== undefined) {
      // Rise checks and readings are measured from fedAt; none may end up before it.
      const earliest = await this.feedings.earliestReadingAt(id);
      if (earliest && earliest.getTime() < Date.parse(request.fedAt)) {
        throw fieldError('fedAt', 'This feeding has rise checks or temperatures from before this time.');
      }
    }
    const row = await this.feedings.update(id, {
      ...requestedGrams(request),
      fedAt: request.fedAt,
      flour: request.flour,
      waterTemperatureC: request.waterTemperatureC,
      temperatureC: request.temperatureC,
      initialHeightMm: request.initialHeightMm,
      notes: request.notes,
      observations: request.observations,
    });
    await this.alerts.refreshCulture(row.cultureId);
    return toFeeding(row);
  }

  async delete(account: AccountRecord, id: string): Promise<void> {
    const { cultureId } = await this.requireOwned(account, id);
    if (!(await this.feedings.delete(account.id, id))) throw new NotFoundException('No feeding with this id.');
    // Its photos' rows went with it; their images leave the bucket now.
    await this.photoTrash.empty();
    // Its alerts went with it (ON DELETE CASCADE); the previous feeding may want some again.
    await this.alerts.refreshCulture(cultureId);
  }
}
