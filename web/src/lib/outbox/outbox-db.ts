import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { OutboxEntry } from './outbox-types';

interface OutboxSchema extends DBSchema {
  writes: { key: number; value: OutboxEntry; indexes: { key: string } };
}

/** The outbox's IndexedDB store: every method is one transaction, so a closed tab loses nothing. */
export interface OutboxStore {
  /** Adds an entry; false when one with the same key is already there (a double save). */
  add(entry: OutboxEntry): Promise<boolean>;
  /** One account's entries (or everyone's), oldest first. */
  list(accountId?: string): Promise<OutboxEntry[]>;
  put(entry: OutboxEntry): Promise<void>;
  remove(key: string): Promise<void>;
}

export const OUTBOX_DB_NAME = 'peakwise-outbox';

export async function openOutboxStore(name = OUTBOX_DB_NAME): Promise<OutboxStore> {
  const db: IDBPDatabase<OutboxSchema> = await openDB<OutboxSchema>(name, 1, {
    upgrade(d) {
      const writes = d.createObjectStore('writes', { keyPath: 'seq', autoIncrement: true });
      writes.createIndex('key', 'key', { unique: true });
    },
  });
  return {
    async add(entry) {
      const tx = db.transaction('writes', 'readwrite');
      if (await tx.store.index('key').getKey(entry.key)) {
        await tx.done;
        return false;
      }
      const copy = { ...entry };
      delete copy.seq;
      await tx.store.add(copy);
      await tx.done;
      return true;
    },
    async list(accountId) {
      // The primary key is the auto-increment, so getAll() is already in saving order.
      const all = await db.getAll('writes');
      return accountId === undefined ? all : all.filter((e) => e.accountId === accountId);
    },
    async put(entry) {
      if (entry.seq === undefined) throw new Error('OutboxStore.put: entry has no seq (add it first)');
      await db.put('writes', entry);
    },
    async remove(key) {
      const tx = db.transaction('writes', 'readwrite');
      const seq = await tx.store.index('key').getKey(key);
      if (seq !== undefined) await tx.store.delete(seq);
      await tx.done;
    },
  };
}
