import { Controller, Get, Inject, ServiceUnavailableException } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { DevMailListResponse, DevMailMessage } from '@peakwise/shared';
import { Public } from '../common/auth.decorators.js';
import { APP_CONFIG, type AppConfig } from '../config.js';
import { DevMailListView } from './dto/dev-mail.view.js';

/**
 * Mail the local fake SMTP server caught, for development and browser tests. The module is only
 * loaded when DEV_MAIL_URL is set outside production (config.ts), so in production this is a 404.
 * Public because a password-reset mail is read while signed out.
 */
@ApiTags('development')
@Controller('dev/mail')
export class DevMailController {
  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  @Public()
  @Get()
  @ApiOperation({ summary: 'Mail sent by Peakwise in development (never in production)' })
  @ApiOkResponse({ type: DevMailListView })
  @ApiServiceUnavailableResponse({ description: 'The fake mail server is not answering' })
  async list(): Promise<DevMailListResponse> {
    let items: DevMailMessage[];
    try {
      const res = await fetch(`${this.config.mail.devMailUrl}/messages`, { signal: AbortSignal.timeout(5_000) });
      if (!res.ok) throw new Error(`status ${res.status}`);
      items = ((await res.json()) as { items: DevMailMessage[] }).items;
    } catch {
      throw new ServiceUnavailableException('The local fake mail server is not answering; is it running?');
    }
    return {
      items: items.map((m) => ({
        to: m.to,
        from: m.from,
        subject: m.subject,
        date: m.date,
        text: m.text,
        html: m.html,
        messageId: m.messageId,
      })),
    };
  }
}
