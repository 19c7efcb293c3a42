import { Controller, Get, Query, Res } from '@nestjs/common';
import { ApiForbiddenResponse, ApiNotFoundResponse, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { ClassProgressResponse, RosterResponse } from '@peakwise/shared';
import type { FastifyReply } from 'fastify';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { ClassRosterService } from './class-roster.service.js';
import { RosterCsvQueryDto, RosterQueryDto } from './dto/roster.query.js';
import { ProgressView, RosterView } from './dto/roster.view.js';

const NOT_YOURS = 'No class you teach with this id';
const STUDENT = 'A student of the class: only its instructor sees the roster';

/** The instructor's overview of a class: the roster table, the same as CSV, and the class chart. */
@ApiTags('class logs')
@Controller('classes/:classId')
export class ClassRosterController {
  constructor(private readonly service: ClassRosterService) {}

  @Get('roster')
  @ApiOkResponse({ type: RosterView, description: 'One row per active student culture; default sort sluggish' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  roster(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @Query() query: RosterQueryDto,
  ): Promise<RosterResponse> {
    return this.service.roster(account, classId, query);
  }

  @Get('roster.csv')
  @ApiProduces('text/csv')
  @ApiOkResponse({ description: 'Every roster row (same filter and order), units in the headers' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  async rosterCsv(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @Query() query: RosterCsvQueryDto,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<string> {
    const { fileName, csv } = await this.service.csv(account, classId, query);
    reply.header('content-type', 'text/csv; charset=utf-8');
    reply.header('content-disposition', `attachment; filename="${fileName}"`);
    return csv;
  }

  @Get('progress')
  @ApiOkResponse({ type: ProgressView, description: 'Per culture: time to peak restated at 1:1:1 and 24 °C' })
  @ApiForbiddenResponse({ description: STUDENT })
  @ApiNotFoundResponse({ description: NOT_YOURS })
  progress(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
  ): Promise<ClassProgressResponse> {
    return this.service.progress(account, classId);
  }
}
