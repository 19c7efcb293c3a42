import type { Role } from '@peakwise/shared';

export const ROLE_LABELS: Record<Role, string> = {
  baker: 'Baker',
  instructor: 'Instructor',
  admin: 'Admin',
};

/** "Amara Quist is now an instructor." — said after a role change. */
export function roleChangedMessage(displayName: string, role: Role): string {
  const article = role === 'admin' || role === 'instructor' ? 'an' : 'a';
  return `${displayName} is now ${article} ${ROLE_LABELS[role].toLowerCase()}.`;
}
