import type { Photo } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { formatPhotoTime, groupByFeeding, photoAlt } from './photo-words';

const photo = (id: string, feedingId: string | null, createdAt: string): Photo => ({
  id,
  subjectType: feedingId ? 'feeding' : 'bake-plan',
  subjectId: feedingId ?? 'plan',
  cultureId: 'c',
  feedingId,
  caption: null,
  width: 1200,
  height: 1600,
  displayUrl: `/api/photos/${id}/display`,
  thumbnailUrl: `/api/photos/${id}/thumbnail`,
  takenAt: null,
  createdAt,
});

describe('photo words', () => {
  it('says the time in the viewer’s zone and clock', () => {
    const iso = '2026-12-01T14:05:00.000Z';
    expect(formatPhotoTime(iso, 'Europe/London', '24h')).toBe('Tue 1 Dec, 14:05');
    expect(formatPhotoTime(iso, 'America/Chicago', '12h')).toBe('Tue 1 Dec, 8:05 AM');
  });

  it('describes a photo by its caption, else by what and when', () => {
    const p = photo('1', 'f1', '2026-12-01T14:05:00.000Z');
    expect(photoAlt(p, 'Tue 1 Dec')).toBe('Jar photo, Tue 1 Dec');
    expect(photoAlt({ ...p, caption: 'Domed at peak' }, 'Tue 1 Dec')).toBe('Domed at peak');
    expect(photoAlt({ ...p, subjectType: 'bake-plan' }, 'Tue 1 Dec')).toBe('Crumb photo, Tue 1 Dec');
  });

  it('puts the strip in time order and cuts it where the feeding changes', () => {
    const groups = groupByFeeding([
      photo('3', 'f2', '2026-12-02T09:00:00.000Z'),
      photo('1', 'f1', '2026-12-01T09:00:00.000Z'),
      photo('2', 'f1', '2026-12-01T13:00:00.000Z'),
      photo('4', 'f2', '2026-12-02T12:00:00.000Z'),
    ]);
    expect(groups.map((g) => [g.feedingId, g.photos.map((p) => p.id)])).toEqual([
      ['f1', ['1', '2']],
      ['f2', ['3', '4']],
    ]);
  });
});
