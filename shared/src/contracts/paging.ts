export const SORT_ORDERS = ['asc', 'desc'] as const;
export type SortOrder = (typeof SORT_ORDERS)[number];

/** One page of a long list; `total` counts every item the filter matches, not just this page. */
export interface Paged<T> {
  items: T[];
  total: number;
  limit: number;
  offset: number;
}

/** Query parameters every paged list accepts. */
export interface PageQuery {
  limit?: number;
  offset?: number;
}
