import { Inject, Injectable } from '@nestjs/common';
import type { CommentSubjectType } from '@peakwise/shared';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

/** What a thread hangs on: a feeding (of a culture) or a bake plan, and whose log it is. */
export interface Thread {
  type: CommentSubjectType;
  /** The feeding's or the plan's id. */
  id: string;
  ownerId: string;
  /** The feeding's culture (alerts about a feeding belong to its culture); null for a plan. */
  cultureId: string | null;
  /** The culture's name for a feeding, the plan's name for a plan. */
  name: string;
}

export interface CommentRow {
  id: string;
  authorId: string;
  authorName: string;
  body: string;
  createdAt: Date;
  feedingId: string | null;
  planId: string | null;
}

/** The only place SQL about comments is written. */
@Injectable()
export class CommentRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  async feedingThread(feedingId: string): Promise<Thread | undefined> {
    const row = await this.db
      .selectFrom('feeding as f')
      .innerJoin('culture as c', 'c.id', 'f.cultureId')
      .select(['f.id', 'c.id as cultureId', 'c.accountId', 'c.name'])
      .where('f.id', '=', feedingId)
      .executeTakeFirst();
    return row && { type: 'feeding', id: row.id, ownerId: row.accountId, cultureId: row.cultureId, name: row.name };
  }

  async planThread(planId: string): Promise<Thread | undefined> {
    const row = await this.db
      .selectFrom('bakePlan')
      .select(['id', 'accountId', 'name'])
      .where('id', '=', planId)
      .executeTakeFirst();
    return row && { type: 'bake-plan', id: row.id, ownerId: row.accountId, cultureId: null, name: row.name };
  }

  private comments() {
    return this.db
      .selectFrom('comment as m')
      .innerJoin('account as a', 'a.id', 'm.authorId')
      .select([
        'm.id',
        'm.authorId',
        'a.displayName as authorName',
        'm.body',
        'm.createdAt',
        'm.feedingId',
        'm.planId',
      ]);
  }

  /** Oldest first; the id breaks ties so pages never overlap. */
  async list(thread: Thread, page: { limit: number; offset: number }): Promise<{ items: CommentRow[]; total: number }> {
    const column = thread.type === 'feeding' ? 'feedingId' : 'planId';
    const [items, count] = await Promise.all([
      this.comments()
        .where(`m.${column}`, '=', thread.id)
        .orderBy('m.createdAt', 'asc')
        .orderBy('m.id', 'asc')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      this.db
        .selectFrom('comment')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .where(column, '=', thread.id)
        .executeTakeFirstOrThrow(),
    ]);
    return { items, total: Number(count.n) };
  }

  find(commentId: string): Promise<CommentRow | undefined> {
    return this.comments().where('m.id', '=', commentId).executeTakeFirst();
  }

  async insert(thread: Thread, authorId: string, body: string): Promise<CommentRow> {
    const { id } = await this.db
      .insertInto('comment')
      .values({
        authorId,
        body,
        feedingId: thread.type === 'feeding' ? thread.id : null,
        planId: thread.type === 'bake-plan' ? thread.id : null,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const row = await this.find(id);
    if (!row) throw new Error(`comment ${id} vanished after insert`);
    return row;
  }

  /** Its alerts go with it (alert.comment_id cascades). */
  async delete(commentId: string): Promise<void> {
    await this.db.deleteFrom('comment').where('id', '=', commentId).execute();
  }
}
