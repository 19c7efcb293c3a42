// An invitation's preview stays apart from the classroom's root key: joining invalidates
// 'classes', and asking about a link that joining just spent would answer 410 under the notice.
// The code preview sits under 'classes', so its "already a member" flag follows a join.
export const classJoinKeys = {
  invite: (token: string) => ['class-invite', token] as const,
  code: (code: string) => ['classes', 'join-preview', 'code', code] as const,
};
