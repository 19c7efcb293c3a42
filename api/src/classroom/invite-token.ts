import { createHash, randomBytes } from 'node:crypto';
import type { ClassInvite, ClassInviteStatus } from '@peakwise/shared';
import type { InviteRow } from './class-invite.repository.js';

/** 32 random bytes: unguessable; only the SHA-256 is stored (sql/0010). */
export function newInviteToken(): string {
  return randomBytes(32).toString('base64url');
}

export function hashInviteToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** What newInviteToken() makes; anything else cannot be a link of ours. */
export const INVITE_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

/** Used beats revoked (a used invitation cannot be revoked), and both beat expiry. */
export function inviteStatus(row: InviteRow, now = new Date()): ClassInviteStatus {
  if (row.usedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  return row.expiresAt <= now ? 'expired' : 'pending';
}

export function toClassInvite(row: InviteRow, now = new Date()): ClassInvite {
  return {
    id: row.id,
    email: row.email,
    status: inviteStatus(row, now),
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
    acceptedAt: row.usedAt ? row.usedAt.toISOString() : null,
  };
}
