import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { BakingClass, ClassJoinPreview } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { ClassJoinService } from './class-join.service.js';
import { BakingClassView, ClassJoinPreviewView } from './dto/class.view.js';
import { JoinClassByCodeDto } from './dto/invite.dto.js';

const UNKNOWN = 'No class with this join code (or joining by code is off)';
const OWN = 'You teach this class';

/** Joining with the code an instructor hands out (case, spaces and dashes do not matter). */
@ApiTags('classes')
@Controller('class-join')
export class ClassJoinController {
  constructor(private readonly service: ClassJoinService) {}

  @Get(':code')
  @ApiOkResponse({ type: ClassJoinPreviewView, description: 'The class and what joining shares; changes nothing' })
  @ApiBadRequestResponse({ description: 'Field `code`: not 8 characters of the code alphabet' })
  @ApiForbiddenResponse({ description: OWN })
  @ApiNotFoundResponse({ description: UNKNOWN })
  preview(@CurrentAccount() account: AccountRecord, @Param('code') code: string): Promise<ClassJoinPreview> {
    return this.service.previewCode(account, code);
  }

  @Post()
  @Idempotent()
  @HttpCode(200)
  @ApiOkResponse({ type: BakingClassView, description: 'Joined (or already a member: nothing changes)' })
  @ApiBadRequestResponse({ description: 'Field `code`' })
  @ApiForbiddenResponse({ description: OWN })
  @ApiNotFoundResponse({ description: UNKNOWN })
  join(@CurrentAccount() account: AccountRecord, @Body() body: JoinClassByCodeDto): Promise<BakingClass> {
    return this.service.joinByCode(account, body.code);
  }
}
