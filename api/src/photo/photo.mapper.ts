import type { Photo, PhotoSubjectType } from '@peakwise/shared';
import type { PhotoRow } from './photo.repository.js';

export function toPhoto(row: PhotoRow): Photo {
  const subjectType = row.subjectType as PhotoSubjectType;
  const subjectId =
    subjectType === 'feeding' ? row.feedingId : subjectType === 'rise-check' ? row.riseCheckId : row.bakePlanId;
  return {
    id: row.id,
    subjectType,
    subjectId: subjectId ?? '',
    cultureId: row.cultureId,
    feedingId: row.feedingId,
    caption: row.caption,
    width: row.width,
    height: row.height,
    displayUrl: `/api/photos/${row.id}/display`,
    thumbnailUrl: `/api/photos/${row.id}/thumbnail`,
    takenAt: row.takenAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
  };
}
