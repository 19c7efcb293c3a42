import { Inject, Injectable } from '@nestjs/common';
import type { BakePlanSettings, BakePlanStatus, PlanInput, PlanTiming } from '@peakwise/shared';
import { sql } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

export interface BakePlanRow {
  id: string;
  accountId: string;
  formulaId: string | null;
  formulaName: string | null;
  cultureId: string | null;
  cultureName: string | null;
  name: string;
  status: BakePlanStatus;
  settings: BakePlanSettings;
  input: PlanInput;
  timing: PlanTiming;
  readyAt: Date;
  kineticsBasis: 'culture' | 'default';
  dairyOrEgg: boolean;
  notes: string | null;
  rating: number | null;
  feedingId: string | null;
  finishedAt: Date | null;
  cancelledAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}

export interface NewBakePlan {
  formulaId: string;
  cultureId: string | null;
  name: string;
  settings: BakePlanSettings;
  input: PlanInput;
  timing: PlanTiming;
  readyAt: string;
  kineticsBasis: 'culture' | 'default';
  dairyOrEgg: boolean;
}

export interface CheckedStepRow {
  stepId: string;
  startedAt: Date;
  endedAt: Date | null;
}

export interface DoughReadingRow {
  id: string;
  takenAt: Date;
  temperatureC: number | null;
  risePct: number | null;
  createdAt: Date;
}

export interface KitchenReadingRow {
  takenAt: Date;
  temperatureC: number;
}

/** Everything logged against a plan that the live re-plan reads. */
export interface PlanLog {
  checked: CheckedStepRow[];
  readings: DoughReadingRow[];
  kitchen: KitchenReadingRow[];
}

export interface PlanRecordChanges {
  name?: string;
  status?: BakePlanStatus;
  notes?: string | null;
  rating?: number | null;
  feedingId?: string | null;
  finishedAt?: Date;
  cancelledAt?: Date;
}

/** The only place SQL about bake plans is written. Plans are scoped to the owning account here. */
@Injectable()
export class BakePlanRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  private selectPlans(accountId: string) {
    return this.db
      .selectFrom('bakePlan')
      .leftJoin('formula', 'formula.id', 'bakePlan.formulaId')
      .leftJoin('culture', 'culture.id', 'bakePlan.cultureId')
      .where('bakePlan.accountId', '=', accountId);
  }

  async findOwned(accountId: string, id: string): Promise<BakePlanRow | undefined> {
    const row = await this.selectPlans(accountId)
      .selectAll('bakePlan')
      .select(['formula.name as formulaName', 'culture.name as cultureName'])
      .where('bakePlan.id', '=', id)
      .executeTakeFirst();
    return row as BakePlanRow | undefined;
  }

  async list(accountId: string, query: { limit: number; offset: number; status?: BakePlanStatus }) {
    let where = this.selectPlans(accountId);
    if (query.status) where = where.where('bakePlan.status', '=', query.status);
    const [items, count] = await Promise.all([
      where
        .select([
          'bakePlan.id',
          'bakePlan.name',
          'bakePlan.status',
          'bakePlan.readyAt',
          'bakePlan.createdAt',
          'formula.name as formulaName',
          'culture.name as cultureName',
        ])
        .orderBy('bakePlan.createdAt', 'desc')
        .orderBy('bakePlan.id', 'desc')
        .limit(query.limit)
        .offset(query.offset)
        .execute(),
      where.select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow(),
    ]);
    return { items: items.map((r) => ({ ...r, status: r.status as BakePlanStatus })), total: Number(count.n) };
  }

  async insert(accountId: string, plan: NewBakePlan): Promise<string> {
    const { id } = await this.db
      .insertInto('bakePlan')
      .values({
        accountId,
        formulaId: plan.formulaId,
        cultureId: plan.cultureId,
        name: plan.name,
        settings: JSON.stringify(plan.settings),
        input: JSON.stringify(plan.input),
        timing: JSON.stringify(plan.timing),
        readyAt: plan.readyAt,
        kineticsBasis: plan.kineticsBasis,
        dairyOrEgg: plan.dairyOrEgg,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    return id;
  }

  async update(accountId: string, id: string, changes: PlanRecordChanges): Promise<boolean> {
    const result = await this.db
      .updateTable('bakePlan')
      .set({ ...changes, updatedAt: sql`now()` })
      .where('id', '=', id)
      .where('accountId', '=', accountId)
      .executeTakeFirst();
    return result.numUpdatedRows > 0n;
  }

  async delete(accountId: string, id: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('bakePlan')
      .where('id', '=', id)
      .where('accountId', '=', accountId)
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }

  /** In time order. The caller has checked that the plan is the account's. */
  checkedSteps(planId: string): Promise<CheckedStepRow[]> {
    return this.db
      .selectFrom('bakePlanStep')
      .select(['stepId', 'startedAt', 'endedAt'])
      .where('planId', '=', planId)
      .orderBy('startedAt')
      .orderBy('stepId')
      .execute();
  }

  /** A second check-off of the same step replaces its times. */
  async checkOff(planId: string, step: CheckedStepRow): Promise<void> {
    await this.db
      .insertInto('bakePlanStep')
      .values({ planId, ...step })
      .onConflict((oc) =>
        oc.columns(['planId', 'stepId']).doUpdateSet({
          startedAt: step.startedAt,
          endedAt: step.endedAt,
          updatedAt: sql`now()`,
        }),
      )
      .execute();
  }

  async undoCheckOff(planId: string, stepId: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('bakePlanStep')
      .where('planId', '=', planId)
      .where('stepId', '=', stepId)
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }

  /** The check-offs, dough readings and kitchen series of a plan the caller may read. */
  async log(planId: string): Promise<PlanLog> {
    const [checked, readings, kitchen] = await Promise.all([
      this.checkedSteps(planId),
      this.readings(planId),
      this.kitchenReadings(planId),
    ]);
    return { checked, readings, kitchen };
  }

  /** Oldest first. */
  kitchenReadings(planId: string): Promise<KitchenReadingRow[]> {
    return this.db
      .selectFrom('kitchenReading')
      .select(['takenAt', 'temperatureC'])
      .where('planId', '=', planId)
      .orderBy('takenAt')
      .execute();
  }

  /** Oldest first. */
  readings(planId: string): Promise<DoughReadingRow[]> {
    return this.db
      .selectFrom('doughReading')
      .select(['id', 'takenAt', 'temperatureC', 'risePct', 'createdAt'])
      .where('planId', '=', planId)
      .orderBy('takenAt')
      .orderBy('id')
      .execute();
  }

  insertReading(
    planId: string,
    reading: { takenAt: string; temperatureC: number | null; risePct: number | null },
  ): Promise<DoughReadingRow> {
    return this.db
      .insertInto('doughReading')
      .values({ planId, ...reading })
      .returning(['id', 'takenAt', 'temperatureC', 'risePct', 'createdAt'])
      .executeTakeFirstOrThrow();
  }

  async deleteReading(planId: string, readingId: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('doughReading')
      .where('planId', '=', planId)
      .where('id', '=', readingId)
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }

  /** The culture a feeding belongs to, if the feeding is the account's. */
  async feedingCulture(accountId: string, feedingId: string): Promise<string | undefined> {
    const row = await this.db
      .selectFrom('feeding')
      .innerJoin('culture', 'culture.id', 'feeding.cultureId')
      .select('feeding.cultureId')
      .where('feeding.id', '=', feedingId)
      .where('culture.accountId', '=', accountId)
      .executeTakeFirst();
    return row?.cultureId;
  }
}
