import { Body, Controller, Delete, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiGoneResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
  ApiConflictResponse,
} from '@nestjs/swagger';
import type {
  BakingClass,
  ClassInviteListResponse,
  ClassJoinPreview,
  CreateClassInvitesResponse,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { ClassInviteService } from './class-invite.service.js';
import { ClassJoinService } from './class-join.service.js';
import { ListInvitesQuery } from './dto/class.dto.js';
import {
  BakingClassView,
  ClassInviteListView,
  ClassJoinPreviewView,
  CreateClassInvitesView,
} from './dto/class.view.js';
import { CreateClassInvitesDto } from './dto/invite.dto.js';

const NOT_YOURS = 'No class you teach or belong to with this id';
const STUDENT = 'You are a student of this class; only its instructor can do this';

/** The instructor's invitations of a class. */
@ApiTags('classes')
@Controller('classes/:classId/invites')
export class ClassInviteController {
  constructor(private readonly service: ClassInviteService) {}

  @Post()
  @Idempotent()
  @ApiCreatedResponse({
    type: CreateClassInvitesView,
    description: 'One single-use link per address, mailed; duplicates in the list collapse to one',
  })
  @ApiBadRequestResponse({ description: 'Field `emails`: 1–50 addresses, the message names the ones to fix' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  create(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @Body() body: CreateClassInvitesDto,
  ): Promise<CreateClassInvitesResponse> {
    return this.service.create(account, classId, body.emails);
  }

  @Get()
  @ApiOkResponse({ type: ClassInviteListView, description: 'Newest first, with each one’s status' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  list(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @Query() query: ListInvitesQuery,
  ): Promise<ClassInviteListResponse> {
    return this.service.list(account, classId, query);
  }

  @Delete(':inviteId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Revoked: the link stops working (revoking twice is fine)' })
  @ApiConflictResponse({ description: 'Already accepted; remove the student instead' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: `${NOT_YOURS}, or no invitation with this id in it` })
  revoke(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('inviteId') inviteId: string,
  ): Promise<void> {
    return this.service.revoke(account, classId, inviteId);
  }
}

const WRONG_ADDRESS = 'The invitation was sent to another address, or you teach this class';
const GONE = 'Expired, already used or revoked';

/** A student opening an e-mailed invitation link (signed in with the invited address). */
@ApiTags('classes')
@Controller('class-invites/:token')
export class ClassInviteLinkController {
  constructor(private readonly service: ClassJoinService) {}

  @Get()
  @ApiOkResponse({ type: ClassJoinPreviewView, description: 'The class and what joining shares; changes nothing' })
  @ApiForbiddenResponse({ description: WRONG_ADDRESS })
  @ApiGoneResponse({ description: GONE })
  @ApiNotFoundResponse({ description: 'No invitation with this link' })
  preview(@CurrentAccount() account: AccountRecord, @Param('token') token: string): Promise<ClassJoinPreview> {
    return this.service.previewInvite(account, token);
  }

  @Post('accept')
  @Idempotent()
  @HttpCode(200)
  @ApiOkResponse({ type: BakingClassView, description: 'Joined; the link is spent' })
  @ApiForbiddenResponse({ description: `${WRONG_ADDRESS}; the link stays unspent` })
  @ApiGoneResponse({ description: GONE })
  @ApiNotFoundResponse({ description: 'No invitation with this link' })
  accept(@CurrentAccount() account: AccountRecord, @Param('token') token: string): Promise<BakingClass> {
    return this.service.acceptInvite(account, token);
  }
}
