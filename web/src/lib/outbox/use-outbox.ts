import { useMemo, useSyncExternalStore } from 'react';
import { outboxSnapshot, subscribeOutbox } from './outbox';
import type { OutboxEntry } from './outbox-types';

export interface OutboxView {
  entries: readonly OutboxEntry[];
  /** Waiting to be sent. */
  waiting: number;
  /** Refused by the server; kept until the baker opens or discards them. */
  failed: number;
}

/** The writes on this device not yet on the server: one account's, or all (no account known). */
export function useOutbox(accountId?: string): OutboxView {
  const all = useSyncExternalStore(subscribeOutbox, outboxSnapshot);
  return useMemo(() => {
    const entries = accountId === undefined ? all : all.filter((e) => e.accountId === accountId);
    const failed = entries.filter((e) => e.state === 'failed').length;
    return { entries, waiting: entries.length - failed, failed };
  }, [all, accountId]);
}

const subscribeOnline = (listener: () => void) => {
  window.addEventListener('online', listener);
  window.addEventListener('offline', listener);
  return () => {
    window.removeEventListener('online', listener);
    window.removeEventListener('offline', listener);
  };
};

/** The browser's idea of being online (true may still mean a signal too weak to use). */
export function useOnline(): boolean {
  return useSyncExternalStore(subscribeOnline, () => navigator.onLine);
}

/** "1 not yet sent", "20 not yet sent". */
export const notYetSentWords = (count: number) => `${count} not yet sent`;
