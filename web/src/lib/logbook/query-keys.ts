// The logbook's query keys. Every write invalidates `logbookKeys.all`, so the Shelf, the culture
// page and the forms never show a stale prediction after a feeding or a rise check.
export const logbookKeys = {
  all: ['cultures'] as const,
  list: (params: Record<string, unknown>) => ['cultures', 'list', params] as const,
  culture: (id: string) => ['cultures', id] as const,
  summary: (id: string) => ['cultures', id, 'summary'] as const,
  feedings: (id: string, params: Record<string, unknown>) => ['cultures', id, 'feedings', params] as const,
};
