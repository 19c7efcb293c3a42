import { Inject, Injectable } from '@nestjs/common';
import type { CultureLocation, CultureSort, SortOrder } from '@peakwise/shared';
import { sql, type ExpressionBuilder } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { DB } from '../db/types.js';

export interface CultureRow {
  id: string;
  accountId: string;
  name: string;
  notes: string | null;
  defaultFlour: string | null;
  defaultHydrationPct: number | null;
  location: CultureLocation;
  /** YYYY-MM-DD. Read as text: pg would turn a date into a Date at local midnight. */
  startedOn: string | null;
  parentCultureId: string | null;
  archivedAt: Date | null;
  lastFedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}

export interface CultureFields {
  name?: string;
  notes?: string | null;
  defaultFlour?: string | null;
  defaultHydrationPct?: number | null;
  location?: CultureLocation;
  startedOn?: string | null;
  parentCultureId?: string | null;
}

export interface CultureChanges extends CultureFields {
  archived?: boolean;
}

export interface CultureListFilter {
  archived?: boolean;
  sort: CultureSort;
  order: SortOrder;
  limit: number;
  offset: number;
}

export type ParentProblem = 'no-parent' | 'cycle';

function columns(eb: ExpressionBuilder<DB, 'culture'>) {
  return [
    'culture.id',
    'culture.accountId',
    'culture.name',
    'culture.notes',
    'culture.defaultFlour',
    'culture.defaultHydrationPct',
    sql<CultureLocation>`culture.location`.as('location'),
    sql<string | null>`to_char(culture.started_on, 'YYYY-MM-DD')`.as('startedOn'),
    'culture.parentCultureId',
    'culture.archivedAt',
    eb
      .selectFrom('feeding')
      .select((f) => f.fn.max('feeding.fedAt').as('lastFedAt'))
      .whereRef('feeding.cultureId', '=', 'culture.id')
      .$castTo<Date | null>()
      .as('lastFedAt'),
    'culture.createdAt',
    'culture.updatedAt',
  ] as const;
}

/** The only place SQL about cultures is written. Every query is scoped to the owning account. */
@Injectable()
export class CultureRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  findOwned(accountId: string, id: string): Promise<CultureRow | undefined> {
    return this.db
      .selectFrom('culture')
      .select(columns)
      .where('culture.id', '=', id)
      .where('culture.accountId', '=', accountId)
      .executeTakeFirst();
  }

  async list(accountId: string, filter: CultureListFilter): Promise<{ items: CultureRow[]; total: number }> {
    let where = this.db.selectFrom('culture').where('culture.accountId', '=', accountId);
    if (filter.archived !== undefined) {
      where = where.where('culture.archivedAt', filter.archived ? 'is not' : 'is', null);
    }
    let items = where.select(columns);
    items =
      filter.sort === 'name'
        ? items.orderBy(sql`lower(culture.name)`, filter.order)
        : items.orderBy('lastFedAt', (ob) => (filter.order === 'asc' ? ob.asc() : ob.desc()).nullsLast());
    const [rows, count] = await Promise.all([
      items.orderBy('culture.id').limit(filter.limit).offset(filter.offset).execute(),
      where.select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow(),
    ]);
    return { items: rows, total: Number(count.n) };
  }

  /** Inserts unless the parent is not one of the account's cultures (checked in one transaction). */
  insert(accountId: string, fields: CultureFields & { name: string }): Promise<{ id: string } | 'no-parent'> {
    return this.db.transaction().execute(async (trx) => {
      if (fields.parentCultureId) {
        // KEY SHARE: the parent cannot be deleted between this check and the insert.
        const parent = await trx
          .selectFrom('culture')
          .select('id')
          .where('id', '=', fields.parentCultureId)
          .where('accountId', '=', accountId)
          .forKeyShare()
          .executeTakeFirst();
        if (!parent) return 'no-parent';
      }
      const row = await trx
        .insertInto('culture')
        .values({ ...fields, accountId })
        .returning('id')
        .executeTakeFirstOrThrow();
      return { id: row.id };
    });
  }

  /**
   * Applies changes to an owned culture. A new parent must be the account's and must not be the
   * culture itself or one of its descendants. Lineage changes of one account are serialised by an
   * advisory lock, so two concurrent changes cannot close a cycle between them.
   */
  update(accountId: string, id: string, changes: CultureChanges): Promise<'ok' | 'not-found' | ParentProblem> {
    const { archived, ...fields } = changes;
    return this.db.transaction().execute(async (trx) => {
      const parentId = fields.parentCultureId;
      if (parentId) {
        await sql`SELECT pg_advisory_xact_lock(hashtextextended(${`culture-lineage:${accountId}`}, 0))`.execute(trx);
        const parent = await trx
          .selectFrom('culture')
          .select('id')
          .where('id', '=', parentId)
          .where('accountId', '=', accountId)
          .forKeyShare()
          .executeTakeFirst();
        if (!parent) return 'no-parent';
        // Walks up from the new parent; UNION (not UNION ALL) stops even on a cycle already stored.
        const { rows } = await sql<{ cycle: boolean }>`
          WITH RECURSIVE ancestor (id, parent_culture_id) AS (
            SELECT id, parent_culture_id FROM culture WHERE id = ${parentId}
            UNION
            SELECT c.id, c.parent_culture_id FROM culture c JOIN ancestor a ON c.id = a.parent_culture_id
          )
          SELECT EXISTS (SELECT 1 FROM ancestor WHERE id = ${id}) AS cycle`.execute(trx);
        if (rows[0]?.cycle) return 'cycle';
      }
      const archivedAt =
        archived === undefined ? {} : { archivedAt: archived ? sql<Date>`coalesce(archived_at, now())` : null };
      const updated = await trx
        .updateTable('culture')
        .set({ ...fields, ...archivedAt, updatedAt: sql<Date>`now()` })
        .where('id', '=', id)
        .where('accountId', '=', accountId)
        .returning('id')
        .executeTakeFirst();
      return updated ? 'ok' : 'not-found';
    });
  }

  /** Deletes the culture with its feedings, rise checks and readings; its children lose their parent. */
  async delete(accountId: string, id: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('culture')
      .where('id', '=', id)
      .where('accountId', '=', accountId)
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }
}
