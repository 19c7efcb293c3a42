/** One picked file on its way up: waiting, sending (with its progress), or how it ended. */
export type UploadStatus = 'refused' | 'waiting' | 'sending' | 'processing' | 'done' | 'failed';

export interface UploadItem {
  /** Stable across re-renders and retries. */
  key: string;
  name: string;
  size: number;
  status: UploadStatus;
  /** Bytes sent so far, of `size` (the browser's count for the whole request, body included). */
  sent: number;
  total: number;
  /** Why it was refused or failed; null otherwise. */
  message: string | null;
  /** A failure of the connection or the server, not of the file: sending it again may work. */
  retryable: boolean;
}

export type UploadAction =
  | { type: 'add'; items: { key: string; name: string; size: number; problem: string | null }[] }
  | { type: 'start'; key: string }
  | { type: 'progress'; key: string; sent: number; total: number }
  | { type: 'done'; key: string }
  | { type: 'failed'; key: string; message: string; retryable: boolean }
  | { type: 'retry'; key: string }
  | { type: 'dismiss'; key: string }
  | { type: 'clear-finished' };

const isMoving = (i: UploadItem) => i.status === 'waiting' || i.status === 'sending' || i.status === 'processing';

function update(items: UploadItem[], key: string, change: Partial<UploadItem>): UploadItem[] {
  return items.map((item) => (item.key === key ? { ...item, ...change } : item));
}

/** The uploader's list, as a reducer: pure, so the states a phone can go through are unit-tested. */
export function uploadReducer(items: UploadItem[], action: UploadAction): UploadItem[] {
  switch (action.type) {
    case 'add':
      // A new pick starts a new list: what went up before is in the grid, what was refused has
      // been read; a file still on its way, or failed and worth retrying, stays.
      return [
        ...items.filter((i) => isMoving(i) || (i.status === 'failed' && i.retryable)),
        ...action.items.map((i): UploadItem => ({
          key: i.key,
          name: i.name,
          size: i.size,
          status: i.problem === null ? 'waiting' : 'refused',
          sent: 0,
          total: i.size,
          message: i.problem,
          retryable: false,
        })),
      ];
    case 'start':
      return update(items, action.key, { status: 'sending', sent: 0, message: null });
    case 'progress': {
      // Every byte sent means the server now re-encodes it; the bar would otherwise sit at 100 %.
      const status: UploadStatus = action.total > 0 && action.sent >= action.total ? 'processing' : 'sending';
      return update(items, action.key, { status, sent: action.sent, total: action.total });
    }
    case 'done':
      return update(items, action.key, { status: 'done', message: null });
    case 'failed':
      return update(items, action.key, { status: 'failed', message: action.message, retryable: action.retryable });
    case 'retry':
      return items.map((item) =>
        item.key === action.key && item.status === 'failed' && item.retryable
          ? { ...item, status: 'waiting', sent: 0, message: null, retryable: false }
          : item,
      );
    case 'dismiss':
      return items.filter((item) => item.key !== action.key);
    case 'clear-finished':
      return items.filter((item) => item.status !== 'done');
  }
}

/** 0–100 for the progress bar; a file not yet started is 0, a finished one 100. */
export function percent(item: UploadItem): number {
  if (item.status === 'done' || item.status === 'processing') return 100;
  if (item.status !== 'sending' || item.total <= 0) return 0;
  return Math.min(100, Math.round((item.sent / item.total) * 100));
}

/** Whether something is still on its way (the buttons stay usable; this only drives the summary). */
export function isBusy(items: readonly UploadItem[]): boolean {
  return items.some(isMoving);
}

/** "2 of 3 photos added · 1 could not be added", or null when nothing was picked. */
export function summary(items: readonly UploadItem[]): string | null {
  if (items.length === 0) return null;
  const done = items.filter((i) => i.status === 'done').length;
  const bad = items.filter((i) => i.status === 'failed' || i.status === 'refused').length;
  const word = items.length === 1 ? 'photo' : 'photos';
  const parts = [`${done} of ${items.length} ${word} added`];
  if (bad > 0) parts.push(`${bad} could not be added`);
  return parts.join(' · ');
}
