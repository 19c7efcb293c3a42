import { Body, Controller, Delete, Get, HttpCode, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { CommentListResponse, CommentView } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { CommentService } from './comment.service.js';
import { CreateCommentDto, ListCommentsQuery } from './dto/comment.dto.js';
import { CommentListView, CommentViewDoc } from './dto/comment.view.js';

const NO_FEEDING = 'No feeding of yours, or of a current student of yours, with this id';
const NO_PLAN = 'No bake plan of yours, or of a current student of yours, with this id';

/**
 * Comment threads on a feeding or a bake plan, between its owner and the instructors who may read
 * it. A new comment becomes an alert for the other side.
 */
@ApiTags('comments')
@Controller()
export class CommentController {
  constructor(private readonly service: CommentService) {}

  @Get('feedings/:feedingId/comments')
  @ApiOkResponse({ type: CommentListView })
  @ApiNotFoundResponse({ description: NO_FEEDING })
  listOnFeeding(
    @CurrentAccount() account: AccountRecord,
    @IdParam('feedingId') feedingId: string,
    @Query() query: ListCommentsQuery,
  ): Promise<CommentListResponse> {
    return this.service.list(account, 'feeding', feedingId, query);
  }

  @Post('feedings/:feedingId/comments')
  @Idempotent({ required: true })
  @ApiCreatedResponse({ type: CommentViewDoc })
  @ApiBadRequestResponse({ description: 'Field-named: body' })
  @ApiNotFoundResponse({ description: NO_FEEDING })
  commentOnFeeding(
    @CurrentAccount() account: AccountRecord,
    @IdParam('feedingId') feedingId: string,
    @Body() body: CreateCommentDto,
  ): Promise<CommentView> {
    return this.service.create(account, 'feeding', feedingId, body);
  }

  @Get('plans/:planId/comments')
  @ApiOkResponse({ type: CommentListView })
  @ApiNotFoundResponse({ description: NO_PLAN })
  listOnPlan(
    @CurrentAccount() account: AccountRecord,
    @IdParam('planId') planId: string,
    @Query() query: ListCommentsQuery,
  ): Promise<CommentListResponse> {
    return this.service.list(account, 'bake-plan', planId, query);
  }

  @Post('plans/:planId/comments')
  @Idempotent({ required: true })
  @ApiCreatedResponse({ type: CommentViewDoc })
  @ApiBadRequestResponse({ description: 'Field-named: body' })
  @ApiNotFoundResponse({ description: NO_PLAN })
  commentOnPlan(
    @CurrentAccount() account: AccountRecord,
    @IdParam('planId') planId: string,
    @Body() body: CreateCommentDto,
  ): Promise<CommentView> {
    return this.service.create(account, 'bake-plan', planId, body);
  }

  @Delete('comments/:commentId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted, with the alerts it caused' })
  @ApiForbiddenResponse({ description: 'Someone else wrote it' })
  @ApiNotFoundResponse({ description: 'No comment in a thread you can read with this id' })
  delete(@CurrentAccount() account: AccountRecord, @IdParam('commentId') commentId: string): Promise<void> {
    return this.service.delete(account, commentId);
  }
}
