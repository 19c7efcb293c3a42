import { Inject, Injectable } from '@nestjs/common';
import type { PhotoSubjectType } from '@peakwise/shared';
import { sql, type Insertable, type Selectable } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { Photo } from '../db/types.js';

export type PhotoRow = Selectable<Photo>;
export type NewPhoto = Insertable<Photo>;

/** What a photo is attached to, with whose log it is. */
export interface PhotoSubject {
  type: PhotoSubjectType;
  id: string;
  ownerId: string;
  cultureId: string | null;
  feedingId: string | null;
}

export type PhotoListScope = { feedingId: string } | { bakePlanId: string } | { cultureId: string };

/** The only place SQL about photos is written. Callers check access before listing or changing. */
@Injectable()
export class PhotoRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  async feedingSubject(id: string): Promise<PhotoSubject | undefined> {
    const row = await this.db
      .selectFrom('feeding')
      .innerJoin('culture', 'culture.id', 'feeding.cultureId')
      .select(['feeding.id', 'culture.accountId', 'culture.id as cultureId'])
      .where('feeding.id', '=', id)
      .executeTakeFirst();
    return row && { type: 'feeding', id, ownerId: row.accountId, cultureId: row.cultureId, feedingId: row.id };
  }

  async riseCheckSubject(id: string): Promise<PhotoSubject | undefined> {
    const row = await this.db
      .selectFrom('riseCheck')
      .innerJoin('feeding', 'feeding.id', 'riseCheck.feedingId')
      .innerJoin('culture', 'culture.id', 'feeding.cultureId')
      .select(['feeding.id as feedingId', 'culture.accountId', 'culture.id as cultureId'])
      .where('riseCheck.id', '=', id)
      .executeTakeFirst();
    return (
      row && { type: 'rise-check', id, ownerId: row.accountId, cultureId: row.cultureId, feedingId: row.feedingId }
    );
  }

  async bakePlanSubject(id: string): Promise<PhotoSubject | undefined> {
    const row = await this.db
      .selectFrom('bakePlan')
      .select(['accountId', 'cultureId'])
      .where('id', '=', id)
      .executeTakeFirst();
    return row && { type: 'bake-plan', id, ownerId: row.accountId, cultureId: row.cultureId, feedingId: null };
  }

  async cultureOwner(id: string): Promise<string | undefined> {
    const row = await this.db.selectFrom('culture').select('accountId').where('id', '=', id).executeTakeFirst();
    return row?.accountId;
  }

  insertMany(rows: NewPhoto[]): Promise<PhotoRow[]> {
    return this.db.insertInto('photo').values(rows).returningAll().execute();
  }

  find(id: string): Promise<PhotoRow | undefined> {
    return this.db.selectFrom('photo').selectAll().where('id', '=', id).executeTakeFirst();
  }

  /** Oldest first by when it was taken (the upload time when the camera did not say): a strip reads left to right in time. */
  async list(scope: PhotoListScope, page: { limit: number; offset: number }) {
    const base = this.db.selectFrom('photo').where((eb) => {
      if ('feedingId' in scope) return eb('feedingId', '=', scope.feedingId);
      if ('bakePlanId' in scope) return eb('bakePlanId', '=', scope.bakePlanId);
      // A culture's strip is its jar: feedings and rise checks, not the bakes it leavened.
      return eb.and([eb('cultureId', '=', scope.cultureId), eb('feedingId', 'is not', null)]);
    });
    const [items, count] = await Promise.all([
      base
        .selectAll()
        .orderBy(sql`coalesce(taken_at, created_at)`)
        .orderBy('createdAt')
        .orderBy('id')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      base.select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow(),
    ]);
    return { items, total: Number(count.n) };
  }

  updateCaption(id: string, caption: string | null): Promise<PhotoRow> {
    return this.db.updateTable('photo').set({ caption }).where('id', '=', id).returningAll().executeTakeFirstOrThrow();
  }

  /** The delete trigger moves its object keys to photo_object_trash in the same transaction. */
  async delete(accountId: string, id: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('photo')
      .where('id', '=', id)
      .where('accountId', '=', accountId)
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }

  trashedKeys(limit: number): Promise<string[]> {
    return this.db
      .selectFrom('photoObjectTrash')
      .select('objectKey')
      .orderBy('trashedAt')
      .limit(limit)
      .execute()
      .then((rows) => rows.map((r) => r.objectKey));
  }

  async forgetTrashed(keys: string[]): Promise<void> {
    if (keys.length) await this.db.deleteFrom('photoObjectTrash').where('objectKey', 'in', keys).execute();
  }

  /** Of these keys, the ones a photo row still names. */
  async keysInUse(keys: string[]): Promise<Set<string>> {
    if (!keys.length) return new Set();
    const rows = await this.db
      .selectFrom('photo')
      .select(['displayKey', 'thumbnailKey'])
      .where((eb) => eb.or([eb('displayKey', 'in', keys), eb('thumbnailKey', 'in', keys)]))
      .execute();
    return new Set(rows.flatMap((r) => [r.displayKey, r.thumbnailKey]));
  }
}
