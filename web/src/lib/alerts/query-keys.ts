// Alerts' query keys: marking read invalidates `alertKeys.all`, so the page and the bell agree.
export const alertKeys = {
  all: ['alerts'] as const,
  list: (params: Record<string, unknown>) => ['alerts', 'list', params] as const,
  unread: ['alerts', 'unread'] as const,
  preferences: ['alerts', 'preferences'] as const,
};

/** New alerts reach an open page within this long (the server delivers them at their due time). */
export const ALERT_POLL_MS = 10_000;
