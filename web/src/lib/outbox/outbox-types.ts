/** The writes a baker can make without a signal. */
export type OutboxKind = 'feeding' | 'rise-check' | 'step-done' | 'comment';

/** One write kept on this device until the server has it. */
export interface OutboxEntry {
  /** Order of saving (IndexedDB's auto-increment); replays go oldest first. */
  seq?: number;
  /** The Idempotency-Key made when the baker pressed save, sent with every attempt. */
  key: string;
  /** Whose session may send it: another baker signing in on this device never replays it. */
  accountId: string;
  kind: OutboxKind;
  /** POST path under /api, e.g. `/cultures/…/feedings`. */
  path: string;
  body: unknown;
  /** The page that shows what this write is about (for "Open"). */
  openPath: string;
  /** A few words for the list, e.g. the comment's first line. */
  detail?: string;
  /** When the baker pressed save (ISO). */
  savedAt: string;
  attempts: number;
  state: 'waiting' | 'failed';
  /** The last refusal (failed) or the last reason to wait (waiting). */
  error?: { status: number; message: string };
}

/** What one attempt to send gave. */
export type SendOutcome = { ok: true } | { ok: false; status: number; message: string };

/** What to do with an entry after an attempt. */
export type Verdict = 'sent' | 'retry' | 'failed';

export const KIND_LABEL: Record<OutboxKind, string> = {
  feeding: 'Feeding',
  'rise-check': 'Rise check',
  'step-done': 'Step done',
  comment: 'Comment',
};
