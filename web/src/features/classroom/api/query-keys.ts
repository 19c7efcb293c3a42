// The Classroom's query keys. A write to a class invalidates `classKeys.class(id)`, which covers its
// members, invitations, roster and chart; the class list has its own key so joining or leaving
// refreshes it. The read-only drill-down lives under the class too, apart from the owner's logbook
// keys, so an instructor's cache never mixes with their own cultures.
export const classKeys = {
  all: ['classes'] as const,
  lists: ['classes', 'list'] as const,
  list: (params: Record<string, unknown>) => ['classes', 'list', params] as const,
  class: (classId: string) => ['classes', 'detail', classId] as const,
  members: (classId: string) => ['classes', 'detail', classId, 'members'] as const,
  invites: (classId: string) => ['classes', 'detail', classId, 'invites'] as const,
  roster: (classId: string, params: Record<string, unknown>) =>
    ['classes', 'detail', classId, 'roster', params] as const,
  progress: (classId: string) => ['classes', 'detail', classId, 'progress'] as const,
  /** The read-only logs of one class's students. */
  logs: (classId: string) => ['classes', 'detail', classId, 'logs'] as const,
};

/** `?limit=…&offset=…` from a query object, leaving out what is undefined. */
export function searchOf(query: object): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `?${text}` : '';
}

export const classPath = (classId: string) => `/classes/${encodeURIComponent(classId)}`;
