import { Inject, Injectable } from '@nestjs/common';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

@Injectable()
export class AccountDeletionRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /**
   * One row: everything the account owns goes with it through ON DELETE CASCADE (cultures,
   * feedings, rise checks, temperatures, formulas, plans, photos, alerts, devices, sessions, the
   * classes it teaches, its memberships and comments), and the photo rows' delete trigger lists
   * their stored images in photo_object_trash.
   */
  async delete(accountId: string): Promise<boolean> {
    const result = await this.db.deleteFrom('account').where('id', '=', accountId).executeTakeFirst();
    return result.numDeletedRows > 0n;
  }
}
