import { Body, Controller, Delete, Get, HttpCode, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { RiseCheck, RiseCheckListResponse } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { WriteKey } from '../common/idempotency/write-key.decorator.js';
import { ListRiseChecksQuery } from './dto/list-rise-checks.query.js';
import { CreateRiseCheckDto, UpdateRiseCheckDto } from './dto/rise-check.dto.js';
import { RiseCheckListView, RiseCheckView } from './dto/rise-check.view.js';
import { RiseCheckService } from './rise-check.service.js';

/** Rise checks: one jar height at one moment of a feeding. Another account's ids answer 404. */
@ApiTags('rise checks')
@Controller()
export class RiseCheckController {
  constructor(private readonly service: RiseCheckService) {}

  @Post('feedings/:feedingId/rise-checks')
  @Idempotent({ required: true })
  @ApiCreatedResponse({ type: RiseCheckView })
  @ApiNotFoundResponse({ description: 'No feeding of yours with this id' })
  create(
    @CurrentAccount() account: AccountRecord,
    @IdParam('feedingId') feedingId: string,
    @Body() body: CreateRiseCheckDto,
    @WriteKey() key: string | null,
  ): Promise<RiseCheck> {
    return this.service.create(account, feedingId, body, key);
  }

  @Get('feedings/:feedingId/rise-checks')
  @ApiOkResponse({ type: RiseCheckListView, description: 'Sorted by takenAt, oldest first' })
  @ApiNotFoundResponse({ description: 'No feeding of yours with this id' })
  list(
    @CurrentAccount() account: AccountRecord,
    @IdParam('feedingId') feedingId: string,
    @Query() query: ListRiseChecksQuery,
  ): Promise<RiseCheckListResponse> {
    return this.service.list(account, feedingId, query);
  }

  @Patch('rise-checks/:id')
  @Idempotent()
  @ApiOkResponse({ type: RiseCheckView })
  @ApiNotFoundResponse({ description: 'No rise check of yours with this id' })
  update(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: UpdateRiseCheckDto,
  ): Promise<RiseCheck> {
    return this.service.update(account, id, body);
  }

  @Delete('rise-checks/:id')
  @HttpCode(204)
  @ApiNoContentResponse()
  @ApiNotFoundResponse({ description: 'No rise check of yours with this id' })
  delete(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<void> {
    return this.service.delete(account, id);
  }
}
