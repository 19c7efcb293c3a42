import { Body, Controller, Delete, Get, HttpCode, Patch, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { BakingClass, ClassListResponse, ClassMemberListResponse } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { ClassService } from './class.service.js';
import { CreateClassDto, ListClassesQuery, ListMembersQuery, UpdateClassDto } from './dto/class.dto.js';
import { BakingClassView, ClassListView, ClassMemberListView } from './dto/class.view.js';

const NOT_YOURS = 'No class you teach or belong to with this id';
const STUDENT = 'You are a student of this class; only its instructor can do this';

/** Classes the signed-in account teaches or belongs to, and their members. */
@ApiTags('classes')
@Controller('classes')
export class ClassController {
  constructor(private readonly service: ClassService) {}

  @Post()
  @Idempotent()
  @ApiCreatedResponse({ type: BakingClassView, description: 'With a fresh join code' })
  @ApiBadRequestResponse({ description: 'Field-named: name, description, startsOn, endsOn' })
  @ApiForbiddenResponse({ description: 'Only accounts with the instructor or admin role create classes' })
  create(@CurrentAccount() account: AccountRecord, @Body() body: CreateClassDto): Promise<BakingClass> {
    return this.service.create(account, body);
  }

  @Get()
  @ApiOkResponse({ type: ClassListView, description: 'Classes you teach and classes you are a current member of' })
  list(@CurrentAccount() account: AccountRecord, @Query() query: ListClassesQuery): Promise<ClassListResponse> {
    return this.service.list(account, query);
  }

  @Get(':classId')
  @ApiOkResponse({ type: BakingClassView })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  get(@CurrentAccount() account: AccountRecord, @IdParam('classId') classId: string): Promise<BakingClass> {
    return this.service.get(account, classId);
  }

  @Patch(':classId')
  @ApiOkResponse({ type: BakingClassView })
  @ApiBadRequestResponse({ description: 'Field-named; a moved end is checked against the stored other end' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  update(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @Body() body: UpdateClassDto,
  ): Promise<BakingClass> {
    return this.service.update(account, classId, body);
  }

  @Delete(':classId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its memberships and invitations; sharing ends' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  delete(@CurrentAccount() account: AccountRecord, @IdParam('classId') classId: string): Promise<void> {
    return this.service.delete(account, classId);
  }

  @Get(':classId/members')
  @ApiOkResponse({ type: ClassMemberListView, description: 'Current members by name' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  members(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @Query() query: ListMembersQuery,
  ): Promise<ClassMemberListResponse> {
    return this.service.listMembers(account, classId, query);
  }

  @Delete(':classId/members/:studentId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Removed; the instructor stops seeing their logs at once' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: `${NOT_YOURS}, or no current student with this id in it` })
  removeMember(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('studentId') studentId: string,
  ): Promise<void> {
    return this.service.removeMember(account, classId, studentId);
  }

  @Post(':classId/leave')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Left; sharing with the instructor ends at once' })
  @ApiForbiddenResponse({ description: 'The instructor cannot leave their own class' })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  leave(@CurrentAccount() account: AccountRecord, @IdParam('classId') classId: string): Promise<void> {
    return this.service.leave(account, classId);
  }
}
