import { Body, Controller, Get, HttpCode, Patch, Post, Query } from '@nestjs/common';
import { ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Alert, AlertListResponse, AlertPreferences } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { PageQuery } from '../common/page-query.js';
import { AlertService } from './alert.service.js';
import { AlertPreferencesView, UpdateAlertPreferencesDto } from './dto/alert-preferences.dto.js';
import { AlertListView, AlertView, ReadAllAlertsView, UnreadAlertCountView } from './dto/alert.view.js';

class ListAlertsQuery extends PageQuery(20, 100) {}

/** The signed-in baker's alerts (those already due) and alert settings. */
@ApiTags('alerts')
@Controller()
export class AlertController {
  constructor(private readonly service: AlertService) {}

  @Get('alerts')
  @ApiOkResponse({ type: AlertListView })
  list(@CurrentAccount() account: AccountRecord, @Query() query: ListAlertsQuery): Promise<AlertListResponse> {
    return this.service.list(account, query);
  }

  @Get('alerts/unread-count')
  @ApiOkResponse({ type: UnreadAlertCountView })
  unreadCount(@CurrentAccount() account: AccountRecord): Promise<{ unread: number }> {
    return this.service.unreadCount(account);
  }

  // Marking read is idempotent by nature (the first read time is kept), so no Idempotency-Key.
  @Post('alerts/read-all')
  @HttpCode(200)
  @ApiOkResponse({ type: ReadAllAlertsView })
  readAll(@CurrentAccount() account: AccountRecord): Promise<{ marked: number }> {
    return this.service.markAllRead(account);
  }

  @Post('alerts/:id/read')
  @HttpCode(200)
  @ApiOkResponse({ type: AlertView })
  @ApiNotFoundResponse({ description: 'No alert of yours with this id' })
  read(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<Alert> {
    return this.service.markRead(account, id);
  }

  @Get('account/alert-preferences')
  @ApiOkResponse({ type: AlertPreferencesView })
  preferences(@CurrentAccount() account: AccountRecord): Promise<AlertPreferences> {
    return this.service.preferences(account);
  }

  @Patch('account/alert-preferences')
  @ApiOkResponse({ type: AlertPreferencesView })
  updatePreferences(
    @CurrentAccount() account: AccountRecord,
    @Body() body: UpdateAlertPreferencesDto,
  ): Promise<AlertPreferences> {
    return this.service.updatePreferences(account, body);
  }
}
