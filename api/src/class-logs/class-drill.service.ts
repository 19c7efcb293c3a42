import { Injectable, NotFoundException } from '@nestjs/common';
import type {
  BakePlanListResponse,
  BakePlanStatus,
  BakePlanView,
  Culture,
  CultureListResponse,
  CultureSummary,
  Feeding,
  FeedingListResponse,
  RiseCheckListResponse,
} from '@peakwise/shared';
import { AccountRepository, type AccountRecord } from '../account/account.repository.js';
import { CultureService, type CulturePage } from '../culture/culture.service.js';
import { FeedingService } from '../feeding/feeding.service.js';
import { ClassLogsAccess } from './class-logs.access.js';
import type { LogKind } from './class-logs.repository.js';
import { OwnerReads } from './owner-reads.js';

type Page = { limit: number; offset: number };

/**
 * A student's logs as their instructor sees them: the owner's own read paths (same shapes, same
 * numbers), entered as the owner once ClassLogsAccess has said the instructor may read them. Only
 * read methods are called; instructors never write a student's log.
 */
@Injectable()
export class ClassDrillService {
  constructor(
    private readonly access: ClassLogsAccess,
    private readonly accounts: AccountRepository,
    private readonly cultures: CultureService,
    private readonly feedings: FeedingService,
    private readonly owner: OwnerReads,
  ) {}

  private async account(id: string, kind: LogKind | 'student'): Promise<AccountRecord> {
    const owner = await this.accounts.findById(id);
    if (!owner) throw new NotFoundException(`No ${kind} with this id in this class.`);
    return owner;
  }

  private async student(viewer: AccountRecord, classId: string, studentId: string): Promise<AccountRecord> {
    await this.access.requireStudent(viewer, classId, studentId);
    return this.account(studentId, 'student');
  }

  private async ownerOf(viewer: AccountRecord, classId: string, kind: LogKind, id: string): Promise<AccountRecord> {
    return this.account(await this.access.requireOwner(viewer, classId, kind, id), kind);
  }

  async studentCultures(
    viewer: AccountRecord,
    classId: string,
    studentId: string,
    query: CulturePage,
  ): Promise<CultureListResponse> {
    return this.cultures.list(await this.student(viewer, classId, studentId), query);
  }

  async studentPlans(
    viewer: AccountRecord,
    classId: string,
    studentId: string,
    query: Page & { status?: BakePlanStatus },
  ): Promise<BakePlanListResponse> {
    return this.owner.plans.list(await this.student(viewer, classId, studentId), query);
  }

  async culture(viewer: AccountRecord, classId: string, cultureId: string): Promise<Culture> {
    return this.cultures.get(await this.ownerOf(viewer, classId, 'culture', cultureId), cultureId);
  }

  async summary(viewer: AccountRecord, classId: string, cultureId: string): Promise<CultureSummary> {
    return this.owner.summaries.summary(await this.ownerOf(viewer, classId, 'culture', cultureId), cultureId);
  }

  async cultureFeedings(
    viewer: AccountRecord,
    classId: string,
    cultureId: string,
    query: Page & { order?: 'asc' | 'desc' },
  ): Promise<FeedingListResponse> {
    return this.feedings.list(await this.ownerOf(viewer, classId, 'culture', cultureId), cultureId, query);
  }

  async feeding(viewer: AccountRecord, classId: string, feedingId: string): Promise<Feeding> {
    return this.feedings.get(await this.ownerOf(viewer, classId, 'feeding', feedingId), feedingId);
  }

  async feedingRiseChecks(
    viewer: AccountRecord,
    classId: string,
    feedingId: string,
    query: Page,
  ): Promise<RiseCheckListResponse> {
    return this.owner.riseChecks.list(await this.ownerOf(viewer, classId, 'feeding', feedingId), feedingId, query);
  }

  async plan(viewer: AccountRecord, classId: string, planId: string): Promise<BakePlanView> {
    return this.owner.plans.get(await this.ownerOf(viewer, classId, 'plan', planId), planId);
  }
}
