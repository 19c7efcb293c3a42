import { Inject, Injectable } from '@nestjs/common';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

/** What an e-mailed token is for; 'class-invite' is reserved for Classroom invitations. */
export type TokenPurpose = 'password-reset' | 'class-invite';

/** The only place SQL about account_token is written. Tokens arrive here already hashed. */
@Injectable()
export class AccountTokenRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  async insert(token: {
    accountId: string;
    purpose: TokenPurpose;
    tokenHash: string;
    expiresAt: Date;
  }): Promise<string> {
    const row = await this.db.insertInto('accountToken').values(token).returning('id').executeTakeFirstOrThrow();
    return row.id;
  }

  /** The account an unspent, unexpired token belongs to, without spending it. */
  async findUsable(tokenHash: string, purpose: TokenPurpose): Promise<string | undefined> {
    const row = await this.db
      .selectFrom('accountToken')
      .select('accountId')
      .where('tokenHash', '=', tokenHash)
      .where('purpose', '=', purpose)
      .where('usedAt', 'is', null)
      .where('expiresAt', '>', new Date())
      .executeTakeFirst();
    return row?.accountId;
  }

  /**
   * Spends the token if it is still usable; the check and the write are one statement, so of two
   * requests racing with the same link only one gets the account id back.
   */
  async consume(tokenHash: string, purpose: TokenPurpose): Promise<string | undefined> {
    const now = new Date();
    const row = await this.db
      .updateTable('accountToken')
      .set({ usedAt: now })
      .where('tokenHash', '=', tokenHash)
      .where('purpose', '=', purpose)
      .where('usedAt', 'is', null)
      .where('expiresAt', '>', now)
      .returning('accountId')
      .executeTakeFirst();
    return row?.accountId;
  }

  /** Spends every other open token of this purpose, so older reset links stop working too. */
  async consumeAll(accountId: string, purpose: TokenPurpose): Promise<void> {
    await this.db
      .updateTable('accountToken')
      .set({ usedAt: new Date() })
      .where('accountId', '=', accountId)
      .where('purpose', '=', purpose)
      .where('usedAt', 'is', null)
      .execute();
  }
}
