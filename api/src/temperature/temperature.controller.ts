import { Body, Controller, Delete, Get, HttpCode, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { TemperatureReadingBatchResponse, TemperatureReadingListResponse } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { ListTemperaturesQuery } from './dto/list-temperatures.query.js';
import { CreateTemperatureReadingsDto } from './dto/temperature.dto.js';
import { TemperatureReadingBatchView, TemperatureReadingListView } from './dto/temperature.view.js';
import { TemperatureService } from './temperature.service.js';

/** A feeding's temperature series (manual entries for now). Another account's ids answer 404. */
@ApiTags('temperatures')
@Controller()
export class TemperatureController {
  constructor(private readonly service: TemperatureService) {}

  @Post('feedings/:feedingId/temperatures')
  @Idempotent({ required: true })
  @ApiCreatedResponse({
    type: TemperatureReadingBatchView,
    description: 'Always a batch: { readings: [...] } in, { items: [...] } out; all stored or none',
  })
  @ApiNotFoundResponse({ description: 'No feeding of yours with this id' })
  create(
    @CurrentAccount() account: AccountRecord,
    @IdParam('feedingId') feedingId: string,
    @Body() body: CreateTemperatureReadingsDto,
  ): Promise<TemperatureReadingBatchResponse> {
    return this.service.create(account, feedingId, body);
  }

  @Get('feedings/:feedingId/temperatures')
  @ApiOkResponse({ type: TemperatureReadingListView, description: 'Sorted by takenAt, oldest first' })
  @ApiNotFoundResponse({ description: 'No feeding of yours with this id' })
  list(
    @CurrentAccount() account: AccountRecord,
    @IdParam('feedingId') feedingId: string,
    @Query() query: ListTemperaturesQuery,
  ): Promise<TemperatureReadingListResponse> {
    return this.service.list(account, feedingId, query);
  }

  @Delete('temperatures/:id')
  @HttpCode(204)
  @ApiNoContentResponse()
  @ApiNotFoundResponse({ description: 'No temperature reading of yours with this id' })
  delete(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<void> {
    return this.service.delete(account, id);
  }
}
