import { IDEMPOTENCY_KEY_TTL_HOURS } from '@peakwise/shared';
import type { OutboxEntry, SendOutcome, Verdict } from './outbox-types';
import type { OutboxStore } from './outbox-db';

/**
 * Sent, worth another try, or refused for good. 409 (the first attempt with this key is still
 * running), 408 and 429 clear up on their own, as do 5xx and no answer at all (status 0). 401 is
 * a session that ended: the write waits for the baker to sign in again. Any other 4xx will be
 * refused again however often it is sent (the server's rules, or the same key with another body).
 */
export function verdictOf(outcome: SendOutcome): Verdict {
  if (outcome.ok) return 'sent';
  const { status } = outcome;
  if (status === 0 || status >= 500 || status === 401 || status === 408 || status === 409 || status === 429) {
    return 'retry';
  }
  return status >= 400 ? 'failed' : 'retry';
}

const FIRST_RETRY_MS = 2_000;
const LONGEST_WAIT_MS = 5 * 60_000;

/** Wait before attempt n+1 after n failed ones: doubling from 2 s up to 5 min, ±20 % spread. */
export function retryDelay(attempts: number, random: () => number = Math.random): number {
  const base = Math.min(FIRST_RETRY_MS * 2 ** Math.max(0, attempts - 1), LONGEST_WAIT_MS);
  return Math.round(base * (0.8 + 0.4 * random()));
}

/**
 * The server remembers a key for IDEMPOTENCY_KEY_TTL_HOURS. A write that was tried and never got
 * an answer may have been stored; sent after its key is forgotten it would be stored twice. An
 * hour short of that, such a write stops being sent and asks the baker to look first.
 */
export const KEY_SAFE_MS = (IDEMPOTENCY_KEY_TTL_HOURS - 1) * 3_600_000;
export const TOO_OLD_MESSAGE =
  'Saved over a day ago and perhaps already received. Open the logbook to check before saving it again.';

export interface RoundResult {
  sent: number;
  failed: number;
  /** Set when an entry asked to be tried again: wait this long before the next round. */
  retryInMs?: number;
}

/**
 * One pass over an account's waiting writes, oldest first. A write that must be retried stops
 * the pass, so nothing overtakes it (a feeding saved before a comment reaches the server first);
 * a write refused for good is set aside with its error and the pass goes on.
 */
export async function replayRound(
  store: OutboxStore,
  accountId: string,
  send: (entry: OutboxEntry) => Promise<SendOutcome>,
  random: () => number = Math.random,
  now: number = Date.now(),
): Promise<RoundResult> {
  const result: RoundResult = { sent: 0, failed: 0 };
  for (const entry of await store.list(accountId)) {
    if (entry.state !== 'waiting') continue;
    if (entry.attempts > 0 && now - Date.parse(entry.savedAt) > KEY_SAFE_MS) {
      await store.put({ ...entry, state: 'failed', error: { status: 0, message: TOO_OLD_MESSAGE } });
      result.failed += 1;
      continue;
    }
    const outcome = await send(entry);
    const verdict = verdictOf(outcome);
    if (verdict === 'sent') {
      await store.remove(entry.key);
      result.sent += 1;
      continue;
    }
    const error = outcome.ok ? undefined : { status: outcome.status, message: outcome.message };
    const attempts = entry.attempts + 1;
    if (verdict === 'failed') {
      await store.put({ ...entry, attempts, state: 'failed', error });
      result.failed += 1;
      continue;
    }
    await store.put({ ...entry, attempts, error });
    result.retryInMs = retryDelay(attempts, random);
    return result;
  }
  return result;
}
