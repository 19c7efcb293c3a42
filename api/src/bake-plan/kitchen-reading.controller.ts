import { Body, Controller, Delete, Get, HttpCode, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { KitchenReadingListResponse, KitchenReadingsAdded } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { CreateKitchenReadingsDto } from './dto/kitchen-reading.dto.js';
import { KitchenReadingListView, KitchenReadingsAddedView } from './dto/kitchen-reading.view.js';
import { KitchenReadingService } from './kitchen-reading.service.js';

const NOT_YOURS = 'No bake plan of yours with this id';

/** A bake's kitchen series: a temperature logger's room readings, which the live plan integrates. */
@ApiTags('plans')
@Controller('plans/:id/kitchen-temperatures')
export class KitchenReadingController {
  constructor(private readonly service: KitchenReadingService) {}

  @Post()
  @Idempotent()
  @ApiCreatedResponse({ type: KitchenReadingsAddedView, description: 'Times the plan already has are skipped' })
  @ApiBadRequestResponse({ description: 'Field-named, e.g. readings.3.takenAt' })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  add(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: CreateKitchenReadingsDto,
  ): Promise<KitchenReadingsAdded> {
    return this.service.add(account, id, body);
  }

  @Get()
  @ApiOkResponse({ type: KitchenReadingListView })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  list(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<KitchenReadingListResponse> {
    return this.service.list(account, id);
  }

  @Delete()
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The whole series is removed' })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  clear(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<void> {
    return this.service.clear(account, id);
  }
}
