import { Inject, Injectable } from '@nestjs/common';
import type { Role, TemperatureUnit, UnitSystem } from '@peakwise/shared';
import { sql, type Selectable } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { Account } from '../db/types.js';

export type AccountRecord = Selectable<Account>;

export interface NewAccount {
  email: string;
  displayName: string;
  passwordHash: string;
  role?: Role;
  timeZone?: string;
}

export interface AccountChanges {
  displayName?: string;
  unitSystem?: UnitSystem;
  temperatureUnit?: TemperatureUnit;
  timeZone?: string;
  role?: Role;
  passwordHash?: string;
}

/** The only place SQL about accounts is written. */
@Injectable()
export class AccountRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  findById(id: string): Promise<AccountRecord | undefined> {
    return this.db.selectFrom('account').selectAll().where('id', '=', id).executeTakeFirst();
  }

  findByEmail(email: string): Promise<AccountRecord | undefined> {
    return this.db.selectFrom('account').selectAll().where('email', '=', email).executeTakeFirst();
  }

  /** Inserts unless the e-mail is taken; undefined tells the caller it was. */
  insert(account: NewAccount): Promise<AccountRecord | undefined> {
    return this.db
      .insertInto('account')
      .values(account)
      .onConflict((oc) => oc.column('email').doNothing())
      .returningAll()
      .executeTakeFirst();
  }

  update(id: string, changes: AccountChanges): Promise<AccountRecord | undefined> {
    return this.db
      .updateTable('account')
      .set({ ...changes, updatedAt: new Date() })
      .where('id', '=', id)
      .returningAll()
      .executeTakeFirst();
  }

  async list(limit: number, offset: number): Promise<{ items: AccountRecord[]; total: number }> {
    const [items, count] = await Promise.all([
      this.db
        .selectFrom('account')
        .selectAll()
        .orderBy('createdAt')
        .orderBy('id')
        .limit(limit)
        .offset(offset)
        .execute(),
      this.db
        .selectFrom('account')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .executeTakeFirstOrThrow(),
    ]);
    return { items, total: Number(count.n) };
  }

  async count(): Promise<number> {
    const row = await this.db
      .selectFrom('account')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .executeTakeFirstOrThrow();
    return Number(row.n);
  }

  /**
   * Changes a role unless that would leave no admin. The admin rows are locked first so two
   * admins demoting each other at the same moment cannot both succeed.
   */
  setRoleKeepingAnAdmin(id: string, role: Role): Promise<AccountRecord | 'not-found' | 'last-admin'> {
    return this.db.transaction().execute(async (trx) => {
      const admins = await trx
        .selectFrom('account')
        .select('id')
        .where('role', '=', 'admin')
        .orderBy('id')
        .forUpdate()
        .execute();
      const target = await trx.selectFrom('account').selectAll().where('id', '=', id).forUpdate().executeTakeFirst();
      if (!target) return 'not-found';
      if (target.role === 'admin' && role !== 'admin' && admins.length <= 1) return 'last-admin';
      return trx
        .updateTable('account')
        .set({ role, updatedAt: new Date() })
        .where('id', '=', id)
        .returningAll()
        .executeTakeFirstOrThrow();
    });
  }

  /**
   * Disables (now) or enables an account. Disabling also ends all its sessions in the same
   * transaction, so no request that starts after this returns can still use one.
   */
  setDisabled(id: string, disabled: boolean): Promise<AccountRecord | undefined> {
    return this.db.transaction().execute(async (trx) => {
      const updated = await trx
        .updateTable('account')
        .set((eb) => ({
          disabledAt: disabled ? sql<Date>`coalesce(disabled_at, now())` : null,
          // Disabling ends the sessions for good: enabling again does not revive them.
          sessionEpoch: disabled ? eb('sessionEpoch', '+', 1) : eb.ref('sessionEpoch'),
          updatedAt: new Date(),
        }))
        .where('id', '=', id)
        .returningAll()
        .executeTakeFirst();
      if (updated && disabled) {
        await trx
          .deleteFrom('session')
          .where(sql<string>`sess ->> 'accountId'`, '=', id)
          .execute();
      }
      return updated;
    });
  }

  /**
   * Ends every session of an account except, optionally, the one making the request, and returns
   * the account's new session epoch: the guard refuses sessions with an older one, so a session
   * row that a request under way saves back is dead all the same. The kept session must take the
   * new epoch (the caller sets it on the request's session, which is saved when it answers).
   */
  endSessions(accountId: string, exceptSid?: string): Promise<number> {
    return this.db.transaction().execute(async (trx) => {
      const row = await trx
        .updateTable('account')
        .set((eb) => ({ sessionEpoch: eb('sessionEpoch', '+', 1) }))
        .where('id', '=', accountId)
        .returning('sessionEpoch')
        .executeTakeFirst();
      let query = trx.deleteFrom('session').where(sql<string>`sess ->> 'accountId'`, '=', accountId);
      if (exceptSid) query = query.where('sid', '<>', exceptSid);
      await query.execute();
      return row?.sessionEpoch ?? 0;
    });
  }
}
