// Saving or deleting a formula invalidates `formulaKeys.all`: the list and the open formula
// refetch; the compute answers are keyed by their input, so they stay valid.
export const formulaKeys = {
  all: ['formulas'] as const,
  lists: ['formulas', 'list'] as const,
  list: (params: Record<string, unknown>) => ['formulas', 'list', params] as const,
  detail: (id: string) => ['formulas', 'detail', id] as const,
  compute: (request: unknown) => ['formula-compute', request] as const,
};
