import type { Paged, PageQuery } from './paging.js';

// Photos of the jar (a feeding or a rise check) and of the crumb (a bake). The API re-encodes every
// upload (auto-rotated, metadata such as GPS removed) into a display size and a thumbnail, keeps
// them in S3-compatible storage, and serves them only to whoever may read the log they belong to
// (its owner, or the instructor of a class the owner is a current member of).
//
// Routes:
//   POST /api/feedings/:feedingId/photos · /api/rise-checks/:riseCheckId/photos · /api/plans/:planId/photos
//        multipart/form-data, files in the field "photos" (1–PHOTOS_MAX_PER_REQUEST, each at most
//        PHOTO_MAX_BYTES, JPEG/PNG/WebP decided by the bytes) → 201 PhotoUploadResponse
//   GET  /api/feedings/:feedingId/photos · /api/plans/:planId/photos · /api/cultures/:cultureId/photos
//        (a culture's strip: its feedings' and rise checks' photos, oldest first by when taken) → PhotoListResponse
//   GET  /api/photos/:photoId/display · /api/photos/:photoId/thumbnail → the image (image/webp)
//   PATCH /api/photos/:photoId {caption} · DELETE /api/photos/:photoId → 204 (owner only)

export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;
export const PHOTOS_MAX_PER_REQUEST = 10;
/** Decompression-bomb guard: more pixels than this is refused before decoding (a 50 MP phone photo fits). */
export const PHOTO_MAX_PIXELS = 60_000_000;
export const PHOTO_ACCEPTED_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const PHOTO_DISPLAY_MAX_EDGE = 1600;
export const PHOTO_THUMBNAIL_EDGE = 320;
export const PHOTO_CAPTION_MAX_LENGTH = 200;

export type PhotoSubjectType = 'feeding' | 'rise-check' | 'bake-plan';

export interface Photo {
  id: string;
  subjectType: PhotoSubjectType;
  subjectId: string;
  /** The culture whose log it belongs to (null for a bake without a culture). */
  cultureId: string | null;
  /** The feeding it belongs to, directly or through its rise check (null for a bake). */
  feedingId: string | null;
  caption: string | null;
  /** Of the display image, px. */
  width: number;
  height: number;
  /** Paths under /api to fetch the images (same-origin, sent with the session cookie). */
  displayUrl: string;
  thumbnailUrl: string;
  /** When the camera says it was taken (EXIF, read before the metadata is stripped); null if it does not. */
  takenAt: string | null;
  createdAt: string;
}

export interface PhotoUploadResponse {
  items: Photo[];
}

export type PhotoListQuery = PageQuery;
export type PhotoListResponse = Paged<Photo>;

export interface UpdatePhotoRequest {
  /** null clears it. */
  caption: string | null;
}
