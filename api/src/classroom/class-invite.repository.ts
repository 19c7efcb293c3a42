import { Inject, Injectable } from '@nestjs/common';
import { sql } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import { upsertMembership } from './class.repository.js';

export interface InviteRow {
  id: string;
  classId: string;
  email: string;
  createdAt: Date;
  expiresAt: Date;
  usedAt: Date | null;
  revokedAt: Date | null;
}

export interface NewInvite {
  email: string;
  tokenHash: string;
}

const COLUMNS = ['id', 'classId', 'email', 'createdAt', 'expiresAt', 'usedAt', 'revokedAt'] as const;

/** The only place SQL about class_invite is written. Tokens arrive here already hashed. */
@Injectable()
export class ClassInviteRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /**
   * All in one statement: a request either invites every address or none. The expiry counts from
   * the row's own created_at (the database clock), so the two differ by exactly `ttlDays`.
   */
  insertMany(classId: string, invites: NewInvite[], ttlDays: number): Promise<InviteRow[]> {
    return this.db
      .insertInto('classInvite')
      .values(invites.map((i) => ({ classId, ...i, expiresAt: sql<Date>`now() + make_interval(days => ${ttlDays})` })))
      .returning([...COLUMNS])
      .execute();
  }

  /** Newest first. */
  async list(classId: string, page: { limit: number; offset: number }) {
    const [items, count] = await Promise.all([
      this.db
        .selectFrom('classInvite')
        .select([...COLUMNS])
        .where('classId', '=', classId)
        .orderBy('createdAt', 'desc')
        .orderBy('id')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      this.db
        .selectFrom('classInvite')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .where('classId', '=', classId)
        .executeTakeFirstOrThrow(),
    ]);
    return { items, total: Number(count.n) };
  }

  findByHash(tokenHash: string): Promise<InviteRow | undefined> {
    return this.db
      .selectFrom('classInvite')
      .select([...COLUMNS])
      .where('tokenHash', '=', tokenHash)
      .executeTakeFirst();
  }

  findInClass(classId: string, inviteId: string): Promise<InviteRow | undefined> {
    return this.db
      .selectFrom('classInvite')
      .select([...COLUMNS])
      .where('classId', '=', classId)
      .where('id', '=', inviteId)
      .executeTakeFirst();
  }

  /** Revokes an invitation nobody has used; false when it was used (or revoked) meanwhile. */
  async revoke(inviteId: string): Promise<boolean> {
    const result = await this.db
      .updateTable('classInvite')
      .set({ revokedAt: sql`now()` })
      .where('id', '=', inviteId)
      .where('usedAt', 'is', null)
      .where('revokedAt', 'is', null)
      .executeTakeFirst();
    return result.numUpdatedRows > 0n;
  }

  /**
   * Spends the token and makes the account a member, in one transaction. The spend is ONE
   * conditional UPDATE (unused, unrevoked, unexpired, this address), so of two requests racing with
   * the same link exactly one gets the class id back; the other gets undefined and joins nothing.
   */
  accept(tokenHash: string, accountId: string, email: string): Promise<string | undefined> {
    return this.db.transaction().execute(async (trx) => {
      const spent = await trx
        .updateTable('classInvite')
        .set({ usedAt: sql`now()`, usedBy: accountId })
        .where('tokenHash', '=', tokenHash)
        .where('email', '=', email)
        .where('usedAt', 'is', null)
        .where('revokedAt', 'is', null)
        .where('expiresAt', '>', sql<Date>`now()`)
        .returning('classId')
        .executeTakeFirst();
      if (!spent) return undefined;
      await upsertMembership(trx, spent.classId, accountId);
      return spent.classId;
    });
  }
}
