import { Inject, Injectable } from '@nestjs/common';
import { sql } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { AlertRow } from './alert.repository.js';

/** The SQL of the Alerts page: only alerts already shown in the app (status sent), per account. */
@Injectable()
export class AlertListRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  async list(
    accountId: string,
    page: { limit: number; offset: number },
  ): Promise<{ items: AlertRow[]; total: number }> {
    const base = this.db.selectFrom('alert').where('accountId', '=', accountId).where('status', '=', 'sent');
    const [items, count] = await Promise.all([
      base
        .selectAll()
        .orderBy(sql`read_at IS NULL`, 'desc')
        .orderBy('dueAt', 'desc')
        .orderBy('id')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      base.select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow(),
    ]);
    return { items: items as AlertRow[], total: Number(count.n) };
  }

  async unreadCount(accountId: string): Promise<number> {
    const row = await this.db
      .selectFrom('alert')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .where('accountId', '=', accountId)
      .where('status', '=', 'sent')
      .where('readAt', 'is', null)
      .executeTakeFirstOrThrow();
    return Number(row.n);
  }

  /** Marks one shown alert read (keeping the first read time); false when it is not the account's. */
  async markRead(accountId: string, id: string): Promise<AlertRow | undefined> {
    const row = await this.db
      .updateTable('alert')
      .set({ readAt: sql`coalesce(read_at, now())`, updatedAt: sql`now()` })
      .where('id', '=', id)
      .where('accountId', '=', accountId)
      .where('status', '=', 'sent')
      .returningAll()
      .executeTakeFirst();
    return row as AlertRow | undefined;
  }

  async markAllRead(accountId: string): Promise<number> {
    const rows = await this.db
      .updateTable('alert')
      .set({ readAt: sql`now()`, updatedAt: sql`now()` })
      .where('accountId', '=', accountId)
      .where('status', '=', 'sent')
      .where('readAt', 'is', null)
      .returning('id')
      .execute();
    return rows.length;
  }
}
