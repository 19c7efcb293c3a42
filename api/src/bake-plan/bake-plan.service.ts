import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import {
  BAKE_PLAN_NAME_MAX_LENGTH,
  planBake,
  type BakePlan,
  type BakePlanListResponse,
  type BakePlanPreview,
  type BakePlanView,
  type CheckedStep,
  type CheckOffStepRequest,
  type CreateBakePlanRequest,
  type CreateDoughReadingRequest,
  type DoughReading,
  type FinishBakePlanRequest,
  type PlanInput,
  type PlanOption,
  type PreviewBakePlanRequest,
  type UpdateBakePlanRequest,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { fieldError } from '../common/validation.js';
import { FormulaService } from '../formula/formula.service.js';
import { PhotoTrash } from '../photo/photo.trash.js';
import { calendarFileName, planCalendar } from './bake-plan.calendar.js';
import { checkReadyAt, defaultPlanName, planInputOf, plainSettings, withPlannerErrors } from './bake-plan.input.js';
import { PlanKineticsSource } from './bake-plan.kinetics.js';
import { livePlan, stepIdsOf, toCheckedStep, toDoughReading, toView } from './bake-plan.live.js';
import { BakePlanRepository, type BakePlanRow, type PlanRecordChanges } from './bake-plan.repository.js';
import { doughFromFormula, type DoughFromFormula } from './plan-dough.js';

/** Where "now" comes from; tests move it to look at a plan at set times. */
@Injectable()
export class BakePlanClock {
  now(): Date {
    return new Date();
  }
}

const NOT_FOUND = 'No bake plan with this id.';
const STEP_ID = /^[a-z][a-z0-9-]{0,39}$/;

interface Prepared {
  input: PlanInput;
  dough: DoughFromFormula;
  formulaName: string;
  cultureId: string | null;
  kineticsBasis: 'culture' | 'default';
}

@Injectable()
export class BakePlanService {
  constructor(
    private readonly plans: BakePlanRepository,
    private readonly formulas: FormulaService,
    private readonly kinetics: PlanKineticsSource,
    private readonly clock: BakePlanClock,
    private readonly alerts: AlertScheduler,
    private readonly photoTrash: PhotoTrash,
  ) {}

  /** The account's plan, or 404 — also for another account's id, so ids reveal nothing. */
  private async requireOwned(account: AccountRecord, id: string): Promise<BakePlanRow> {
    const row = await this.plans.findOwned(account.id, id);
    if (!row) throw new NotFoundException(NOT_FOUND);
    return row;
  }

  private async requireActive(account: AccountRecord, id: string): Promise<BakePlanRow> {
    const row = await this.requireOwned(account, id);
    if (row.status !== 'active')
      throw new ConflictException(`This plan is ${row.status}; it takes no more changes to its steps.`);
    return row;
  }

  /** Formula → dough, culture → kinetics, settings → the planner's input (404s for others' ids). */
  private async prepare(account: AccountRecord, request: PreviewBakePlanRequest, now: Date): Promise<Prepared> {
    checkReadyAt(request, now);
    const formula = await this.formulas.get(account, request.formulaId);
    const dough = doughFromFormula(formula.computed);
    if (!(dough.dough.starterG > 0)) {
      throw fieldError('formulaId', 'This formula has no starter line: add the levain to plan a sourdough bake.');
    }
    if (!(dough.dough.flourG > 0)) {
      throw fieldError('formulaId', 'This formula has no flour line besides the starter’s: add the flour you mix in.');
    }
    const culture = request.cultureId ? await this.kinetics.forCulture(account, request.cultureId, now) : null;
    const input = planInputOf(plainSettings(request), {
      now,
      timeZone: account.timeZone,
      dough,
      kinetics: culture?.kinetics ?? null,
    });
    return {
      input,
      dough,
      formulaName: formula.name,
      cultureId: culture?.id ?? null,
      kineticsBasis: culture?.kinetics ? 'culture' : 'default',
    };
  }

  async preview(account: AccountRecord, request: PreviewBakePlanRequest): Promise<BakePlanPreview> {
    const prepared = await this.prepare(account, request, this.clock.now());
    const plan = withPlannerErrors(() => planBake(prepared.input));
    return { plan, dough: prepared.input.dough, kineticsBasis: prepared.kineticsBasis };
  }

  async create(account: AccountRecord, request: CreateBakePlanRequest): Promise<BakePlanView> {
    const prepared = await this.prepare(account, request, this.clock.now());
    const plan = withPlannerErrors(() => planBake(prepared.input));
    const option = chosenOption(plan, request);
    const timing = option.timing!;
    const readyAt = option.readyAt!;
    const id = await this.plans.insert(account.id, {
      formulaId: request.formulaId,
      cultureId: prepared.cultureId,
      name: request.name ?? defaultPlanName(prepared.formulaName, readyAt, account.timeZone, BAKE_PLAN_NAME_MAX_LENGTH),
      settings: plainSettings(request),
      input: prepared.input,
      timing,
      readyAt,
      kineticsBasis: prepared.kineticsBasis,
      dairyOrEgg: prepared.dough.dairyOrEgg,
    });
    await this.alerts.refreshPlan(id);
    return this.get(account, id);
  }

  async list(
    account: AccountRecord,
    query: { limit: number; offset: number; status?: BakePlanRow['status'] },
  ): Promise<BakePlanListResponse> {
    const { items, total } = await this.plans.list(account.id, query);
    return {
      items: items.map((r) => ({ ...r, readyAt: r.readyAt.toISOString(), createdAt: r.createdAt.toISOString() })),
      total,
      limit: query.limit,
      offset: query.offset,
    };
  }

  async get(account: AccountRecord, id: string): Promise<BakePlanView> {
    const row = await this.requireOwned(account, id);
    return this.view(row);
  }

  private async view(row: BakePlanRow): Promise<BakePlanView> {
    const log = await this.plans.log(row.id);
    // A closed plan is a record: its timeline stays as it stood when it was finished or cancelled.
    const at = row.finishedAt ?? row.cancelledAt ?? this.clock.now();
    return toView(row, log, at);
  }

  async update(account: AccountRecord, id: string, request: UpdateBakePlanRequest): Promise<BakePlanView> {
    const row = await this.requireOwned(account, id);
    const changes: PlanRecordChanges = {};
    if (request.name !== undefined) changes.name = request.name;
    if (request.status === 'cancelled' && row.status !== 'cancelled') {
      if (row.status === 'finished') throw new ConflictException('This plan is finished; it cannot be cancelled.');
      changes.status = 'cancelled';
      changes.cancelledAt = this.clock.now();
    }
    await this.plans.update(account.id, id, changes);
    await this.alerts.refreshPlan(id);
    return this.get(account, id);
  }

  /** Finishing again edits the record (notes, rating, feeding) and keeps the first finish time. */
  async finish(account: AccountRecord, id: string, request: FinishBakePlanRequest): Promise<BakePlanView> {
    const row = await this.requireOwned(account, id);
    if (row.status === 'cancelled') throw new ConflictException('This plan was cancelled; it cannot be finished.');
    if (request.feedingId) {
      const cultureId = await this.plans.feedingCulture(account.id, request.feedingId);
      if (cultureId === undefined) throw new NotFoundException('No feeding with this id.');
      if (row.cultureId === null) throw fieldError('feedingId', 'This plan has no culture to link a feeding of.');
      if (cultureId !== row.cultureId) throw fieldError('feedingId', 'Choose a feeding of the culture this plan uses.');
    }
    const changes: PlanRecordChanges = { status: 'finished', finishedAt: row.finishedAt ?? this.clock.now() };
    if (request.notes !== undefined) changes.notes = request.notes;
    if (request.rating !== undefined) changes.rating = request.rating;
    if (request.feedingId !== undefined) changes.feedingId = request.feedingId;
    await this.plans.update(account.id, id, changes);
    await this.alerts.refreshPlan(id);
    return this.get(account, id);
  }

  /** The live plan as an iCalendar file, with the words in the plan's zone and the baker's units. */
  async calendar(account: AccountRecord, id: string): Promise<{ fileName: string; ics: string }> {
    const row = await this.requireOwned(account, id);
    const view = await this.view(row);
    return {
      fileName: calendarFileName(view.name),
      ics: planCalendar(view, row.input.timeZone, account.temperatureUnit),
    };
  }

  async delete(account: AccountRecord, id: string): Promise<void> {
    if (!(await this.plans.delete(account.id, id))) throw new NotFoundException(NOT_FOUND);
    await this.photoTrash.empty();
  }

  /** A step id of this plan's timeline, else a 400 naming the path parameter. */
  private async requireStep(row: BakePlanRow, stepId: string): Promise<void> {
    const problem = 'This plan has no step with this id (e.g. mix, fold-1, bulk-end, bake).';
    if (!STEP_ID.test(stepId)) throw fieldError('stepId', problem);
    const live = livePlan(row, await this.plans.log(row.id), this.clock.now());
    if (!stepIdsOf(row, live).has(stepId)) throw fieldError('stepId', problem);
  }

  async checkOff(
    account: AccountRecord,
    id: string,
    stepId: string,
    request: CheckOffStepRequest,
  ): Promise<CheckedStep> {
    const row = await this.requireActive(account, id);
    await this.requireStep(row, stepId);
    const now = this.clock.now();
    const endedAt = request.endedAt !== undefined ? new Date(request.endedAt) : request.startedAt ? null : now;
    const startedAt = request.startedAt !== undefined ? new Date(request.startedAt) : (endedAt ?? now);
    if (endedAt !== null && endedAt < startedAt) throw fieldError('endedAt', 'End the step at or after its start.');
    const step = { stepId, startedAt, endedAt };
    await this.plans.checkOff(row.id, step);
    await this.alerts.refreshPlan(row.id);
    return toCheckedStep(step);
  }

  async undoCheckOff(account: AccountRecord, id: string, stepId: string): Promise<void> {
    const row = await this.requireActive(account, id);
    if (!(await this.plans.undoCheckOff(row.id, stepId))) throw new NotFoundException('This step is not checked off.');
    await this.alerts.refreshPlan(row.id);
  }

  async addReading(account: AccountRecord, id: string, request: CreateDoughReadingRequest): Promise<DoughReading> {
    const row = await this.requireActive(account, id);
    if (request.temperatureC === undefined && request.risePct === undefined) {
      throw fieldError('temperatureC', 'Give the dough temperature, the jar’s rise, or both.');
    }
    const reading = await this.plans.insertReading(row.id, {
      takenAt: request.takenAt,
      temperatureC: request.temperatureC ?? null,
      risePct: request.risePct ?? null,
    });
    await this.alerts.refreshPlan(row.id);
    return toDoughReading(reading);
  }

  async deleteReading(account: AccountRecord, id: string, readingId: string): Promise<void> {
    const row = await this.requireActive(account, id);
    if (!(await this.plans.deleteReading(row.id, readingId))) throw new NotFoundException('No reading with this id.');
  }
}

/** The option to follow: it must fit (or be the temperature lever's same-day plan). */
function chosenOption(plan: BakePlan, request: CreateBakePlanRequest): PlanOption {
  if (request.useTemperatureLever) {
    if (request.option !== 'same-day') {
      throw fieldError('useTemperatureLever', 'The temperature lever times the same-day option: choose "same-day".');
    }
    if (!plan.temperatureLever) {
      throw fieldError('useTemperatureLever', 'No warmer or cooler spot is needed or would help for these settings.');
    }
    return plan.temperatureLever.option;
  }
  const option = plan.options.find((o) => o.kind === request.option);
  if (!option?.fits || !option.timing || !option.readyAt) {
    const reason = option?.reason ? `: ${option.reason}` : '';
    throw fieldError('option', `This option does not fit${reason}.`);
  }
  return option;
}
