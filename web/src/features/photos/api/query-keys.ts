/** A log photos hang on and are listed under (a culture's list is its strip, across its feedings). */
export interface PhotoList {
  type: 'feeding' | 'bake-plan' | 'culture';
  id: string;
}

/** A log photos are uploaded to. */
export interface PhotoTarget {
  type: 'feeding' | 'rise-check' | 'bake-plan';
  id: string;
}

const BASE: Record<PhotoList['type'] | PhotoTarget['type'], string> = {
  feeding: 'feedings',
  'rise-check': 'rise-checks',
  'bake-plan': 'plans',
  culture: 'cultures',
};

// Any upload, caption or deletion refreshes every photo list: a feeding's photo is also on its
// culture's strip, and the lists are small.
export const photoKeys = {
  all: ['photos'] as const,
  list: (list: PhotoList) => ['photos', list.type, list.id] as const,
};

/** `/feedings/:id/photos`, `/rise-checks/:id/photos`, `/plans/:id/photos` or `/cultures/:id/photos`. */
export function photosPath(on: PhotoList | PhotoTarget): string {
  return `/${BASE[on.type]}/${encodeURIComponent(on.id)}/photos`;
}
