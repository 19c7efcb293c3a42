import type { Photo, UnitSystem } from '@peakwise/shared';

export type ClockStyle = '12h' | '24h';

/** Bakers on US units read a 12-hour clock, everyone else 24 h (as on the Bench). */
export function clockStyle(unitSystem: UnitSystem): ClockStyle {
  return unitSystem === 'us' ? '12h' : '24h';
}

/** "14:05" or "2:05 PM" in the viewer's zone. */
export function formatPhotoClock(iso: string, timeZone: string, style: ClockStyle): string {
  return new Date(iso).toLocaleTimeString(style === '12h' ? 'en-US' : 'en-GB', {
    timeZone,
    hour: style === '12h' ? 'numeric' : '2-digit',
    minute: '2-digit',
    hour12: style === '12h',
  });
}

/** "Tue 1 Dec, 14:05" or "Tue 1 Dec, 2:05 PM" in the viewer's zone. */
export function formatPhotoTime(iso: string, timeZone: string, style: ClockStyle): string {
  const day = new Date(iso).toLocaleDateString('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short' });
  return `${day}, ${formatPhotoClock(iso, timeZone, style)}`;
}

/** "1 Dec" in the viewer's zone, for the strip's small labels. */
export function formatPhotoDay(iso: string, timeZone: string): string {
  return new Date(iso).toLocaleDateString('en-GB', { timeZone, day: 'numeric', month: 'short' });
}

/** When the photo shows: when the camera took it, else when it was added. */
export const shownAt = (photo: Pick<Photo, 'takenAt' | 'createdAt'>): string => photo.takenAt ?? photo.createdAt;

/** What a screen reader says for a thumbnail: its caption, else what it shows and when. */
export function photoAlt(photo: Pick<Photo, 'caption' | 'subjectType' | 'createdAt'>, when: string): string {
  if (photo.caption) return photo.caption;
  const what = photo.subjectType === 'bake-plan' ? 'Crumb photo' : 'Jar photo';
  return `${what}, ${when}`;
}

export interface StripGroup {
  /** The feeding the photos belong to; null for photos of no feeding. */
  feedingId: string | null;
  photos: Photo[];
}

/**
 * The culture's strip in time order, cut where the feeding changes, so each run of photos sits
 * under the feeding it belongs to. The API sends them oldest first; sorted again so the strip
 * never depends on that.
 */
export function groupByFeeding(photos: readonly Photo[]): StripGroup[] {
  const sorted = [...photos].sort((a, b) => Date.parse(a.createdAt) - Date.parse(b.createdAt));
  const groups: StripGroup[] = [];
  for (const photo of sorted) {
    const last = groups.at(-1);
    if (last && last.feedingId === photo.feedingId) last.photos.push(photo);
    else groups.push({ feedingId: photo.feedingId, photos: [photo] });
  }
  return groups;
}

/** The image's address: the API gives paths under /api (with or without that prefix). */
export function imageSrc(url: string): string {
  if (/^\/api\//.test(url) || /^https?:\/\//.test(url)) return url;
  return `/api${url.startsWith('/') ? '' : '/'}${url}`;
}
