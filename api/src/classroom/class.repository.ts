import { Inject, Injectable } from '@nestjs/common';
import { sql, type Kysely } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { DB } from '../db/types.js';

export interface ClassRow {
  id: string;
  name: string;
  description: string;
  startsOn: string;
  endsOn: string;
  instructorId: string;
  instructorName: string;
  joinCode: string | null;
  memberCount: number;
  /** The viewer the row was read for is a current member. */
  viewerIsMember: boolean;
  createdAt: Date;
  updatedAt: Date;
}

export interface ClassFields {
  name: string;
  description: string;
  startsOn: string;
  endsOn: string;
}

export interface MemberRow {
  id: string;
  displayName: string;
  email: string;
  joinedAt: Date;
}

/** Postgres' unique_violation on the join code: another class drew the same code. */
export function isJoinCodeTaken(error: unknown): boolean {
  const e = error as { code?: string; constraint?: string } | undefined;
  return e?.code === '23505' && e.constraint === 'baking_class_join_code_key';
}

/**
 * Makes `accountId` a current member. Joining again after leaving clears left_at and starts the
 * membership anew (joined_at = now); joining while a member changes nothing. Exported for the
 * invitation's transaction, which spends the token and joins in one go.
 */
export async function upsertMembership(db: Kysely<DB>, classId: string, accountId: string): Promise<void> {
  await db
    .insertInto('classMember')
    .values({ classId, accountId })
    .onConflict((oc) =>
      oc.columns(['classId', 'accountId']).doUpdateSet({
        joinedAt: sql`CASE WHEN class_member.left_at IS NULL THEN class_member.joined_at ELSE now() END`,
        leftAt: null,
      }),
    )
    .execute();
}

/** The only place SQL about baking_class and class_member is written (sharing rules: class-access). */
@Injectable()
export class ClassRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** Classes as `viewerId` sees them; visibility is the caller's `where`. */
  private select(viewerId: string) {
    return this.db
      .selectFrom('bakingClass as c')
      .innerJoin('account as i', 'i.id', 'c.instructorId')
      .select((eb) => [
        'c.id',
        'c.name',
        'c.description',
        'c.instructorId',
        'i.displayName as instructorName',
        'c.joinCode',
        'c.createdAt',
        'c.updatedAt',
        sql<string>`to_char(c.starts_on, 'YYYY-MM-DD')`.as('startsOn'),
        sql<string>`to_char(c.ends_on, 'YYYY-MM-DD')`.as('endsOn'),
        eb
          .selectFrom('classMember as m')
          .select(eb.fn.countAll<string>().as('n'))
          .whereRef('m.classId', '=', 'c.id')
          .where('m.leftAt', 'is', null)
          .as('memberCount'),
        eb
          .exists(
            eb
              .selectFrom('classMember as v')
              .select('v.classId')
              .whereRef('v.classId', '=', 'c.id')
              .where('v.accountId', '=', viewerId)
              .where('v.leftAt', 'is', null),
          )
          .as('viewerIsMember'),
      ]);
  }

  private static row(
    r: Omit<ClassRow, 'memberCount' | 'viewerIsMember'> & {
      memberCount: string | number | bigint | null;
      viewerIsMember: boolean | number;
    },
  ): ClassRow {
    return { ...r, memberCount: Number(r.memberCount ?? 0), viewerIsMember: Boolean(r.viewerIsMember) };
  }

  /** Any class by id, read for `viewerId` (the service decides what the viewer may do). */
  async find(viewerId: string, classId: string): Promise<ClassRow | undefined> {
    const row = await this.select(viewerId).where('c.id', '=', classId).executeTakeFirst();
    return row && ClassRepository.row(row);
  }

  async findByJoinCode(viewerId: string, code: string): Promise<ClassRow | undefined> {
    const row = await this.select(viewerId).where('c.joinCode', '=', code).executeTakeFirst();
    return row && ClassRepository.row(row);
  }

  /** Classes `viewerId` teaches or is a current member of: newest start first. */
  async listVisible(viewerId: string, page: { limit: number; offset: number }) {
    const visible = sql<boolean>`(c.instructor_id = ${viewerId} OR EXISTS (SELECT 1 FROM class_member v
      WHERE v.class_id = c.id AND v.account_id = ${viewerId} AND v.left_at IS NULL))`;
    const [items, count] = await Promise.all([
      this.select(viewerId)
        .where(visible)
        .orderBy('c.startsOn', 'desc')
        .orderBy('c.createdAt', 'desc')
        .orderBy('c.id')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      this.db
        .selectFrom('bakingClass as c')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .where(visible)
        .executeTakeFirstOrThrow(),
    ]);
    return { items: items.map((r) => ClassRepository.row(r)), total: Number(count.n) };
  }

  /** Undefined when the join code was taken meanwhile (the caller draws another). */
  async insert(instructorId: string, fields: ClassFields, joinCode: string): Promise<string | undefined> {
    try {
      const row = await this.db
        .insertInto('bakingClass')
        .values({ instructorId, ...fields, joinCode })
        .returning('id')
        .executeTakeFirstOrThrow();
      return row.id;
    } catch (error) {
      if (isJoinCodeTaken(error)) return undefined;
      throw error;
    }
  }

  async update(classId: string, fields: ClassFields): Promise<void> {
    await this.db
      .updateTable('bakingClass')
      .set({ ...fields, updatedAt: sql`now()` })
      .where('id', '=', classId)
      .execute();
  }

  /** False when the code was taken meanwhile (the caller draws another); null turns joining by code off. */
  async setJoinCode(classId: string, joinCode: string | null): Promise<boolean> {
    try {
      await this.db
        .updateTable('bakingClass')
        .set({ joinCode, updatedAt: sql`now()` })
        .where('id', '=', classId)
        .execute();
      return true;
    } catch (error) {
      if (isJoinCodeTaken(error)) return false;
      throw error;
    }
  }

  /** Members, invitations and comments' class links go with it (ON DELETE CASCADE). */
  async delete(classId: string): Promise<void> {
    await this.db.deleteFrom('bakingClass').where('id', '=', classId).execute();
  }

  /** Current members by name. */
  async listMembers(classId: string, page: { limit: number; offset: number }) {
    const [items, count] = await Promise.all([
      this.db
        .selectFrom('classMember as m')
        .innerJoin('account as a', 'a.id', 'm.accountId')
        .select(['a.id', 'a.displayName', 'a.email', 'm.joinedAt'])
        .where('m.classId', '=', classId)
        .where('m.leftAt', 'is', null)
        .orderBy(sql`lower(a.display_name)`)
        .orderBy('a.id')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      this.db
        .selectFrom('classMember')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .where('classId', '=', classId)
        .where('leftAt', 'is', null)
        .executeTakeFirstOrThrow(),
    ]);
    return { items: items as MemberRow[], total: Number(count.n) };
  }

  join(classId: string, accountId: string): Promise<void> {
    return upsertMembership(this.db, classId, accountId);
  }

  /** Ends a current membership (leaving or removal); false when there was none. */
  async markLeft(classId: string, accountId: string): Promise<boolean> {
    const result = await this.db
      .updateTable('classMember')
      .set({ leftAt: sql`now()` })
      .where('classId', '=', classId)
      .where('accountId', '=', accountId)
      .where('leftAt', 'is', null)
      .executeTakeFirst();
    return result.numUpdatedRows > 0n;
  }
}
