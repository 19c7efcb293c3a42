import { Injectable, Logger, NotFoundException } from '@nestjs/common';
import {
  PHOTOS_MAX_PER_REQUEST,
  type Photo,
  type PhotoListResponse,
  type PhotoSubjectType,
  type PhotoUploadResponse,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { ClassAccessRepository } from '../classroom/class-access.repository.js';
import { fieldError } from '../common/validation.js';
import { processPhoto, type ProcessedPhoto } from './photo.image.js';
import { photoTakenAt } from './photo.taken-at.js';
import { toPhoto } from './photo.mapper.js';
import { PhotoRepository, type NewPhoto, type PhotoListScope, type PhotoSubject } from './photo.repository.js';
import { PhotoStorage, type StoredObject } from './photo.storage.js';
import { PhotoTrash } from './photo.trash.js';

/** An uploaded file as the multipart interceptor hands it over (memory storage). */
export interface UploadedPhoto {
  originalname: string;
  buffer?: Buffer;
}

export type PhotoListOwner = 'feeding' | 'bake-plan' | 'culture';
export type PhotoVariant = 'display' | 'thumbnail';

const MISSING: Record<PhotoSubjectType | 'culture', string> = {
  feeding: 'No feeding with this id.',
  'rise-check': 'No rise check with this id.',
  'bake-plan': 'No bake plan with this id.',
  culture: 'No culture with this id.',
};
const NO_PHOTO = 'No photo with this id.';

/**
 * Photos of a log. Only its owner adds, captions or deletes them; whoever may read the log (the
 * owner, or an instructor of a class the owner is a current member of) may list and view them.
 * Anyone else gets 404, as if the id did not exist.
 */
@Injectable()
export class PhotoService {
  private readonly logger = new Logger(PhotoService.name);

  constructor(
    private readonly photos: PhotoRepository,
    private readonly storage: PhotoStorage,
    private readonly trash: PhotoTrash,
    private readonly access: ClassAccessRepository,
  ) {}

  async upload(
    viewer: AccountRecord,
    type: PhotoSubjectType,
    id: string,
    files: UploadedPhoto[],
  ): Promise<PhotoUploadResponse> {
    const subject = await this.subject(type, id);
    if (!subject || subject.ownerId !== viewer.id) throw new NotFoundException(MISSING[type]);
    if (!files.length) {
      throw fieldError('photos', `Attach 1 to ${PHOTOS_MAX_PER_REQUEST} photos in the form field "photos".`);
    }
    // One at a time: decoding a large photo takes a few hundred MB; all-or-nothing, so a refused
    // file leaves nothing behind of the others.
    const processed: ProcessedPhoto[] = [];
    for (const file of files) processed.push(await processPhoto(file.originalname, file.buffer ?? Buffer.alloc(0)));
    const rows = await this.store(subject, viewer, processed);
    return { items: rows.map(toPhoto) };
  }

  async list(
    viewer: AccountRecord,
    owner: PhotoListOwner,
    id: string,
    page: { limit: number; offset: number },
  ): Promise<PhotoListResponse> {
    const ownerId = owner === 'culture' ? await this.photos.cultureOwner(id) : (await this.subject(owner, id))?.ownerId;
    if (!ownerId || !(await this.mayRead(viewer, ownerId))) throw new NotFoundException(MISSING[owner]);
    const scope: PhotoListScope =
      owner === 'feeding' ? { feedingId: id } : owner === 'bake-plan' ? { bakePlanId: id } : { cultureId: id };
    const { items, total } = await this.photos.list(scope, page);
    return { items: items.map(toPhoto), total, limit: page.limit, offset: page.offset };
  }

  async image(viewer: AccountRecord, id: string, variant: PhotoVariant): Promise<StoredObject> {
    const row = await this.photos.find(id);
    if (!row || !(await this.mayRead(viewer, row.accountId))) throw new NotFoundException(NO_PHOTO);
    return this.storage.get(variant === 'display' ? row.displayKey : row.thumbnailKey);
  }

  async updateCaption(viewer: AccountRecord, id: string, caption: string | null): Promise<Photo> {
    const row = await this.photos.find(id);
    if (!row || row.accountId !== viewer.id) throw new NotFoundException(NO_PHOTO);
    return toPhoto(await this.photos.updateCaption(id, caption));
  }

  async delete(viewer: AccountRecord, id: string): Promise<void> {
    if (!(await this.photos.delete(viewer.id, id))) throw new NotFoundException(NO_PHOTO);
    await this.trash.empty();
  }

  private subject(type: PhotoSubjectType, id: string): Promise<PhotoSubject | undefined> {
    if (type === 'feeding') return this.photos.feedingSubject(id);
    if (type === 'rise-check') return this.photos.riseCheckSubject(id);
    return this.photos.bakePlanSubject(id);
  }

  private async mayRead(viewer: AccountRecord, ownerId: string): Promise<boolean> {
    return ownerId === viewer.id || (await this.access.instructsAnywhere(viewer.id, ownerId));
  }

  /** Objects first, rows after: a row never names a missing object. On failure nothing stays. */
  private async store(subject: PhotoSubject, owner: AccountRecord, processed: ProcessedPhoto[]) {
    const rows: NewPhoto[] = [];
    const written: string[] = [];
    // One statement gives every row the same now(): a millisecond apart keeps the order sent.
    const now = Date.now();
    try {
      for (const [index, photo] of processed.entries()) {
        const displayKey = this.storage.newKey();
        const thumbnailKey = this.storage.newKey();
        await this.storage.put(displayKey, photo.display, 'image/webp');
        written.push(displayKey);
        await this.storage.put(thumbnailKey, photo.thumbnail, 'image/webp');
        written.push(thumbnailKey);
        rows.push({
          accountId: owner.id,
          subjectType: subject.type,
          feedingId: subject.feedingId,
          riseCheckId: subject.type === 'rise-check' ? subject.id : null,
          bakePlanId: subject.type === 'bake-plan' ? subject.id : null,
          cultureId: subject.cultureId,
          width: photo.width,
          height: photo.height,
          displayKey,
          thumbnailKey,
          createdAt: new Date(now + index),
          takenAt: photoTakenAt(photo.exif, owner.timeZone, now),
        });
      }
      return await this.photos.insertMany(rows);
    } catch (error) {
      // The subject may have been deleted meanwhile (a foreign key error), or the store failed.
      const left = await this.storage.remove(written);
      if (left.length) this.logger.warn(`${left.length} objects of a failed upload wait for the sweep`);
      if ((error as { code?: string }).code === '23503') throw new NotFoundException(MISSING[subject.type]);
      throw error;
    }
  }
}
