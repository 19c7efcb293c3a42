import { Body, Controller, Delete, Get, HttpCode, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Feeding, FeedingListResponse } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { WriteKey } from '../common/idempotency/write-key.decorator.js';
import { CreateFeedingDto, UpdateFeedingDto } from './dto/feeding.dto.js';
import { FeedingListView, FeedingView } from './dto/feeding.view.js';
import { ListFeedingsQuery } from './dto/list-feedings.query.js';
import { FeedingService } from './feeding.service.js';

/** Feedings of the signed-in baker's cultures. Another account's ids answer 404. */
@ApiTags('feedings')
@Controller()
export class FeedingController {
  constructor(private readonly service: FeedingService) {}

  @Post('cultures/:cultureId/feedings')
  @Idempotent({ required: true })
  @ApiCreatedResponse({ type: FeedingView })
  @ApiNotFoundResponse({ description: 'No culture of yours with this id' })
  create(
    @CurrentAccount() account: AccountRecord,
    @IdParam('cultureId') cultureId: string,
    @Body() body: CreateFeedingDto,
    @WriteKey() key: string | null,
  ): Promise<Feeding> {
    return this.service.create(account, cultureId, body, key);
  }

  @Get('cultures/:cultureId/feedings')
  @ApiOkResponse({ type: FeedingListView })
  @ApiNotFoundResponse({ description: 'No culture of yours with this id' })
  list(
    @CurrentAccount() account: AccountRecord,
    @IdParam('cultureId') cultureId: string,
    @Query() query: ListFeedingsQuery,
  ): Promise<FeedingListResponse> {
    return this.service.list(account, cultureId, query);
  }

  @Get('feedings/:id')
  @ApiOkResponse({ type: FeedingView })
  @ApiNotFoundResponse({ description: 'No feeding of yours with this id' })
  get(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<Feeding> {
    return this.service.get(account, id);
  }

  @Patch('feedings/:id')
  @Idempotent()
  @ApiOkResponse({ type: FeedingView })
  @ApiNotFoundResponse({ description: 'No feeding of yours with this id' })
  update(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: UpdateFeedingDto,
  ): Promise<Feeding> {
    return this.service.update(account, id, body);
  }

  @Delete('feedings/:id')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its rise checks and temperatures' })
  @ApiNotFoundResponse({ description: 'No feeding of yours with this id' })
  delete(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<void> {
    return this.service.delete(account, id);
  }
}
