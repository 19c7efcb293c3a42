import { Inject, Injectable } from '@nestjs/common';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

/**
 * The one rule of sharing, in one place: a class's instructor may read the logs of the class's
 * CURRENT members. Every shared read asks here at request time, so leaving (or being removed)
 * ends the sharing with the next request. Anything else answers "no".
 */
@Injectable()
export class ClassAccessRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** `instructorId` teaches class `classId`, and `studentId` is a current member of it. */
  async instructsInClass(instructorId: string, classId: string, studentId: string): Promise<boolean> {
    const row = await this.db
      .selectFrom('bakingClass as c')
      .innerJoin('classMember as m', 'm.classId', 'c.id')
      .select('c.id')
      .where('c.id', '=', classId)
      .where('c.instructorId', '=', instructorId)
      .where('m.accountId', '=', studentId)
      .where('m.leftAt', 'is', null)
      .executeTakeFirst();
    return row !== undefined;
  }

  /** `instructorId` teaches some class that `studentId` is a current member of. */
  async instructsAnywhere(instructorId: string, studentId: string): Promise<boolean> {
    const row = await this.db
      .selectFrom('bakingClass as c')
      .innerJoin('classMember as m', 'm.classId', 'c.id')
      .select('c.id')
      .where('c.instructorId', '=', instructorId)
      .where('m.accountId', '=', studentId)
      .where('m.leftAt', 'is', null)
      .executeTakeFirst();
    return row !== undefined;
  }

  /** The instructors who may read `studentId`'s logs now (comment alerts go to them). */
  async instructorsOf(studentId: string): Promise<string[]> {
    const rows = await this.db
      .selectFrom('bakingClass as c')
      .innerJoin('classMember as m', 'm.classId', 'c.id')
      .select('c.instructorId')
      .distinct()
      .where('m.accountId', '=', studentId)
      .where('m.leftAt', 'is', null)
      .execute();
    return rows.map((r) => r.instructorId);
  }

  /** A class `instructorId` teaches `studentId` in now, the latest joined (links in comment alerts). */
  async sharedClass(instructorId: string, studentId: string): Promise<string | undefined> {
    const row = await this.db
      .selectFrom('bakingClass as c')
      .innerJoin('classMember as m', 'm.classId', 'c.id')
      .select('c.id')
      .where('c.instructorId', '=', instructorId)
      .where('m.accountId', '=', studentId)
      .where('m.leftAt', 'is', null)
      .orderBy('m.joinedAt', 'desc')
      .limit(1)
      .executeTakeFirst();
    return row?.id;
  }

  /** The viewer is the class's instructor. */
  async teaches(instructorId: string, classId: string): Promise<boolean> {
    const row = await this.db
      .selectFrom('bakingClass')
      .select('id')
      .where('id', '=', classId)
      .where('instructorId', '=', instructorId)
      .executeTakeFirst();
    return row !== undefined;
  }
}
