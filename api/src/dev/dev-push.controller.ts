import { Controller, Get, Inject, ServiceUnavailableException } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { DevPushListResponse, DevPushMessage, PushPayload } from '@peakwise/shared';
import { Public } from '../common/auth.decorators.js';
import { APP_CONFIG, type AppConfig } from '../config.js';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import { DevPushListView } from './dto/dev-push.view.js';
import type { FakePushMessage } from './fake-push.js';
import { httpsJson } from './https-json.js';

/**
 * Notifications the local fake push service received and decrypted, for development and browser
 * tests. Loaded only when DEV_PUSH_URL is set outside production (config.ts): a 404 in production.
 */
@ApiTags('development')
@Controller('dev/push')
export class DevPushController {
  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @Inject(DATABASE) private readonly db: Database,
  ) {}

  @Public()
  @Get()
  @ApiOperation({ summary: 'Push notifications sent by Peakwise in development (never in production)' })
  @ApiOkResponse({ type: DevPushListView })
  @ApiServiceUnavailableResponse({ description: 'The fake push service is not answering' })
  async list(): Promise<DevPushListResponse> {
    const push = this.config.push;
    let items: FakePushMessage[];
    try {
      const res = await httpsJson<{ items: FakePushMessage[] }>(`${push?.devServiceUrl}/messages`, push?.extraCa ?? '');
      if (res.status !== 200) throw new Error(`status ${res.status}`);
      items = res.body.items;
    } catch {
      throw new ServiceUnavailableException('The local fake push service is not answering; is it running?');
    }
    const devices = await this.db.selectFrom('pushSubscription').select(['endpoint', 'label']).execute();
    const labelOf = (deviceId: string) => devices.find((d) => d.endpoint.endsWith(`/push/${deviceId}`))?.label ?? null;
    return {
      items: items.map((m): DevPushMessage => {
        const p = (typeof m.payload === 'object' && m.payload !== null ? m.payload : {}) as Partial<PushPayload>;
        return {
          receivedAt: m.receivedAt,
          device: labelOf(m.deviceId),
          title: p.title ?? String(m.payload),
          body: p.body ?? '',
          url: p.url ?? '/',
          urgency: m.urgency,
          ttl: m.ttl,
        };
      }),
    };
  }
}
