import { Controller, Get, Query } from '@nestjs/common';
import { ApiForbiddenResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type {
  BakePlanListResponse,
  BakePlanView,
  Culture,
  CultureListResponse,
  CultureSummary,
  Feeding,
  FeedingListResponse,
  RiseCheckListResponse,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { ListBakePlansQuery } from '../bake-plan/dto/bake-plan.dto.js';
import { BakePlanListView, BakePlanViewDoc } from '../bake-plan/dto/bake-plan.view.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { CultureSummaryView } from '../culture/dto/culture-summary.view.js';
import { CultureListView, CultureView } from '../culture/dto/culture.view.js';
import { ListCulturesQuery } from '../culture/dto/list-cultures.query.js';
import { FeedingListView, FeedingView } from '../feeding/dto/feeding.view.js';
import { ListFeedingsQuery } from '../feeding/dto/list-feedings.query.js';
import { ListRiseChecksQuery } from '../rise-check/dto/list-rise-checks.query.js';
import { RiseCheckListView } from '../rise-check/dto/rise-check.view.js';
import { ClassDrillService } from './class-drill.service.js';

const GONE = 'Not in a class you teach, or its owner is not a current member';
const STUDENT = 'A student of the class: only its instructor reads its members’ logs';

/**
 * A student's logs, read-only, for the instructor of a class the student is a current member of.
 * Same shapes as the owner's own routes; no write routes here (instructors only comment).
 */
@ApiTags('class logs')
@ApiForbiddenResponse({ description: STUDENT })
@ApiNotFoundResponse({ description: GONE })
@Controller('classes/:classId')
export class ClassDrillController {
  constructor(private readonly service: ClassDrillService) {}

  @Get('students/:studentId/cultures')
  @ApiOkResponse({ type: CultureListView })
  studentCultures(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('studentId') studentId: string,
    @Query() query: ListCulturesQuery,
  ): Promise<CultureListResponse> {
    return this.service.studentCultures(account, classId, studentId, query);
  }

  @Get('students/:studentId/plans')
  @ApiOkResponse({ type: BakePlanListView, description: 'Newest first' })
  studentPlans(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('studentId') studentId: string,
    @Query() query: ListBakePlansQuery,
  ): Promise<BakePlanListResponse> {
    return this.service.studentPlans(account, classId, studentId, query);
  }

  @Get('cultures/:cultureId')
  @ApiOkResponse({ type: CultureView })
  culture(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('cultureId') cultureId: string,
  ): Promise<Culture> {
    return this.service.culture(account, classId, cultureId);
  }

  @Get('cultures/:cultureId/summary')
  @ApiOkResponse({ type: CultureSummaryView })
  summary(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('cultureId') cultureId: string,
  ): Promise<CultureSummary> {
    return this.service.summary(account, classId, cultureId);
  }

  @Get('cultures/:cultureId/feedings')
  @ApiOkResponse({ type: FeedingListView })
  cultureFeedings(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('cultureId') cultureId: string,
    @Query() query: ListFeedingsQuery,
  ): Promise<FeedingListResponse> {
    return this.service.cultureFeedings(account, classId, cultureId, query);
  }

  @Get('feedings/:feedingId')
  @ApiOkResponse({ type: FeedingView })
  feeding(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('feedingId') feedingId: string,
  ): Promise<Feeding> {
    return this.service.feeding(account, classId, feedingId);
  }

  @Get('feedings/:feedingId/rise-checks')
  @ApiOkResponse({ type: RiseCheckListView, description: 'Sorted by takenAt, oldest first' })
  feedingRiseChecks(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('feedingId') feedingId: string,
    @Query() query: ListRiseChecksQuery,
  ): Promise<RiseCheckListResponse> {
    return this.service.feedingRiseChecks(account, classId, feedingId, query);
  }

  @Get('plans/:planId')
  @ApiOkResponse({ type: BakePlanViewDoc, description: '`live` is re-planned at the time of the request' })
  plan(
    @CurrentAccount() account: AccountRecord,
    @IdParam('classId') classId: string,
    @IdParam('planId') planId: string,
  ): Promise<BakePlanView> {
    return this.service.plan(account, classId, planId);
  }
}
