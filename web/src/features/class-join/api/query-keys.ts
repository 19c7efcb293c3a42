// Previews sit under the classroom's root key, so joining (which invalidates 'classes') refreshes
// the "already a member" flag along with every class list.
export const classJoinKeys = {
  invite: (token: string) => ['classes', 'join-preview', 'invite', token] as const,
  code: (code: string) => ['classes', 'join-preview', 'code', code] as const,
};
