import { Inject, Injectable } from '@nestjs/common';
import type { ClassRole } from '@peakwise/shared';
import { sql } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

export interface ClassStudent {
  id: string;
  displayName: string;
}

/** Who owns a log row: the drill-down asks the sharing rule about this account. */
export type LogKind = 'culture' | 'feeding' | 'plan';

/**
 * The SQL of the instructor's read-only view. Whether the instructor may read a student's logs is
 * never decided here: that is ClassAccessRepository.instructsInClass, asked on every request.
 */
@Injectable()
export class ClassLogsRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** The viewer's relation to the class: its instructor, a current member, or nothing (null). */
  async roleIn(accountId: string, classId: string): Promise<ClassRole | null> {
    const row = await this.db
      .selectFrom('bakingClass as c')
      .leftJoin('classMember as m', (join) =>
        join.onRef('m.classId', '=', 'c.id').on('m.accountId', '=', accountId).on('m.leftAt', 'is', null),
      )
      .select(['c.instructorId', 'm.accountId as memberId'])
      .where('c.id', '=', classId)
      .executeTakeFirst();
    if (!row) return null;
    if (row.instructorId === accountId) return 'instructor';
    return row.memberId ? 'student' : null;
  }

  /** The class's name and first day (YYYY-MM-DD, read as text like every calendar date). */
  async classInfo(classId: string): Promise<{ name: string; startsOn: string } | undefined> {
    return this.db
      .selectFrom('bakingClass')
      .select(['name', sql<string>`to_char(starts_on, 'YYYY-MM-DD')`.as('startsOn')])
      .where('id', '=', classId)
      .executeTakeFirst();
  }

  /** Current members (not left), by name. */
  currentStudents(classId: string): Promise<ClassStudent[]> {
    return this.db
      .selectFrom('classMember as m')
      .innerJoin('account as a', 'a.id', 'm.accountId')
      .select(['a.id', 'a.displayName'])
      .where('m.classId', '=', classId)
      .where('m.leftAt', 'is', null)
      .orderBy('a.displayName')
      .orderBy('a.id')
      .execute();
  }

  /** Every student's active cultures, in one query (the roster's rows). */
  activeCultureIds(studentIds: string[]): Promise<{ id: string; accountId: string }[]> {
    if (studentIds.length === 0) return Promise.resolve([]);
    return this.db
      .selectFrom('culture')
      .select(['id', 'accountId'])
      .where('accountId', 'in', studentIds)
      .where('archivedAt', 'is', null)
      .orderBy('createdAt')
      .orderBy('id')
      .execute();
  }

  /** The account that owns a culture, feeding or bake plan; undefined when there is no such row. */
  async ownerOf(kind: LogKind, id: string): Promise<string | undefined> {
    const row =
      kind === 'culture'
        ? await this.db.selectFrom('culture').select('accountId').where('id', '=', id).executeTakeFirst()
        : kind === 'plan'
          ? await this.db.selectFrom('bakePlan').select('accountId').where('id', '=', id).executeTakeFirst()
          : await this.db
              .selectFrom('feeding')
              .innerJoin('culture', 'culture.id', 'feeding.cultureId')
              .select('culture.accountId')
              .where('feeding.id', '=', id)
              .executeTakeFirst();
    return row?.accountId;
  }
}
