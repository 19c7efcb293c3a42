import { Injectable, NotFoundException } from '@nestjs/common';
import type {
  CreateTemperatureReadingsRequest,
  TemperatureReadingBatchResponse,
  TemperatureReadingListResponse,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { requireNotBeforeFeeding } from '../feeding/feeding-time.js';
import { FeedingService } from '../feeding/feeding.service.js';
import { toTemperatureReading } from './temperature.mapper.js';
import { TemperatureRepository } from './temperature.repository.js';

@Injectable()
export class TemperatureService {
  constructor(
    private readonly readings: TemperatureRepository,
    private readonly feedings: FeedingService,
    private readonly alerts: AlertScheduler,
  ) {}

  async create(
    account: AccountRecord,
    feedingId: string,
    request: CreateTemperatureReadingsRequest,
  ): Promise<TemperatureReadingBatchResponse> {
    const feeding = await this.feedings.requireOwned(account, feedingId);
    requireNotBeforeFeeding(
      feeding.fedAt,
      request.readings.map((reading, i) => ({ field: `readings.${i}.takenAt`, at: reading.takenAt })),
    );
    const rows = await this.readings.insertMany(
      request.readings.map((reading) => ({ feedingId, takenAt: reading.takenAt, temperatureC: reading.temperatureC })),
    );
    await this.alerts.refreshCulture(feeding.cultureId);
    return { items: rows.map(toTemperatureReading) };
  }

  async list(
    account: AccountRecord,
    feedingId: string,
    page: { limit: number; offset: number },
  ): Promise<TemperatureReadingListResponse> {
    await this.feedings.requireOwned(account, feedingId);
    const { items, total } = await this.readings.list(feedingId, page);
    return { items: items.map(toTemperatureReading), total, limit: page.limit, offset: page.offset };
  }

  async delete(account: AccountRecord, id: string): Promise<void> {
    const cultureId = await this.alerts.readingCulture(id);
    if (!(await this.readings.delete(account.id, id))) {
      throw new NotFoundException('No temperature reading with this id.');
    }
    if (cultureId) await this.alerts.refreshCulture(cultureId);
  }
}
