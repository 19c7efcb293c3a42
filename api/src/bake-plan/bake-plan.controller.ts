import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query, Res } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import type { BakePlanListResponse, BakePlanPreview, BakePlanView, CheckedStep, DoughReading } from '@peakwise/shared';
import type { FastifyReply } from 'fastify';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { BakePlanService } from './bake-plan.service.js';
import {
  CheckOffStepDto,
  CreateBakePlanDto,
  CreateDoughReadingDto,
  FinishBakePlanDto,
  ListBakePlansQuery,
  PreviewBakePlanDto,
  UpdateBakePlanDto,
} from './dto/bake-plan.dto.js';
import {
  BakePlanListView,
  BakePlanPreviewView,
  BakePlanViewDoc,
  CheckedStepView,
  DoughReadingView,
} from './dto/bake-plan.view.js';

const NOT_YOURS = 'No bake plan of yours with this id';

/** Bench: the signed-in baker's bake plans, private to them. Another account's ids answer 404. */
@ApiTags('plans')
@Controller('plans')
export class BakePlanController {
  constructor(private readonly service: BakePlanService) {}

  @Post('preview')
  @Idempotent()
  @HttpCode(200)
  @ApiOkResponse({ type: BakePlanPreviewView, description: 'The options for these settings; stores nothing' })
  @ApiBadRequestResponse({ description: 'Field-named, e.g. quietHours.from or steps.folds.sets' })
  @ApiNotFoundResponse({ description: 'No formula or culture of yours with this id' })
  preview(@CurrentAccount() account: AccountRecord, @Body() body: PreviewBakePlanDto): Promise<BakePlanPreview> {
    return this.service.preview(account, body);
  }

  @Post()
  @Idempotent()
  @ApiCreatedResponse({ type: BakePlanViewDoc })
  @ApiBadRequestResponse({ description: 'Field-named; `option` when the chosen option does not fit' })
  @ApiNotFoundResponse({ description: 'No formula or culture of yours with this id' })
  create(@CurrentAccount() account: AccountRecord, @Body() body: CreateBakePlanDto): Promise<BakePlanView> {
    return this.service.create(account, body);
  }

  @Get()
  @ApiOkResponse({ type: BakePlanListView, description: 'Newest first' })
  list(@CurrentAccount() account: AccountRecord, @Query() query: ListBakePlansQuery): Promise<BakePlanListResponse> {
    return this.service.list(account, query);
  }

  @Get(':id')
  @ApiOkResponse({
    type: BakePlanViewDoc,
    description: '`live` is re-planned at the time of the request (a closed plan: at its finish or cancel)',
  })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  get(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<BakePlanView> {
    return this.service.get(account, id);
  }

  @Get(':id/calendar.ics')
  @ApiProduces('text/calendar')
  @ApiOkResponse({ description: 'iCalendar (RFC 5545): one event per step of the live plan, in UTC' })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  async calendar(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<string> {
    const { fileName, ics } = await this.service.calendar(account, id);
    reply.header('content-type', 'text/calendar; charset=utf-8');
    reply.header('content-disposition', `attachment; filename="${fileName}"`);
    return ics;
  }

  @Patch(':id')
  @Idempotent()
  @ApiOkResponse({ type: BakePlanViewDoc })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  @ApiConflictResponse({ description: 'Cancelling a finished plan' })
  update(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: UpdateBakePlanDto,
  ): Promise<BakePlanView> {
    return this.service.update(account, id, body);
  }

  @Delete(':id')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its check-offs and readings' })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  delete(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<void> {
    return this.service.delete(account, id);
  }

  @Post(':id/steps/:stepId/done')
  @Idempotent({ required: true })
  @ApiCreatedResponse({ type: CheckedStepView, description: 'Checking the same step again replaces its times' })
  @ApiBadRequestResponse({
    description: 'Field-named: stepId when the plan has no such step; endedAt before startedAt',
  })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  @ApiConflictResponse({ description: 'The plan is finished or cancelled' })
  checkOff(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Param('stepId') stepId: string,
    @Body() body: CheckOffStepDto,
  ): Promise<CheckedStep> {
    return this.service.checkOff(account, id, stepId, body);
  }

  @Delete(':id/steps/:stepId/done')
  @Idempotent()
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The check-off is undone' })
  @ApiNotFoundResponse({ description: 'No plan of yours with this id, or the step is not checked off' })
  undoCheckOff(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Param('stepId') stepId: string,
  ): Promise<void> {
    return this.service.undoCheckOff(account, id, stepId);
  }

  @Post(':id/readings')
  @Idempotent({ required: true })
  @ApiCreatedResponse({ type: DoughReadingView })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  @ApiConflictResponse({ description: 'The plan is finished or cancelled' })
  addReading(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: CreateDoughReadingDto,
  ): Promise<DoughReading> {
    return this.service.addReading(account, id, body);
  }

  @Delete(':id/readings/:readingId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The reading is deleted' })
  @ApiNotFoundResponse({ description: 'No plan of yours with this id, or no such reading in it' })
  deleteReading(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @IdParam('readingId') readingId: string,
  ): Promise<void> {
    return this.service.deleteReading(account, id, readingId);
  }

  @Post(':id/finish')
  @Idempotent()
  @HttpCode(200)
  @ApiOkResponse({ type: BakePlanViewDoc, description: 'Finishing again edits the record' })
  @ApiBadRequestResponse({ description: 'feedingId when the feeding is not of the plan’s culture' })
  @ApiNotFoundResponse({ description: 'No plan (or feeding) of yours with this id' })
  @ApiConflictResponse({ description: 'The plan was cancelled' })
  finish(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: FinishBakePlanDto,
  ): Promise<BakePlanView> {
    return this.service.finish(account, id, body);
  }
}
