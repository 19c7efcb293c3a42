// The Bench's query keys. Every write on a plan invalidates `benchKeys.all`, so the list's "next
// step" and the live page's re-plan never lag a check-off or a reading.
export const benchKeys = {
  all: ['plans'] as const,
  list: (params: Record<string, unknown>) => ['plans', 'list', params] as const,
  plan: (id: string) => ['plans', id] as const,
  formulas: ['plans', 'formula-picker'] as const,
};
