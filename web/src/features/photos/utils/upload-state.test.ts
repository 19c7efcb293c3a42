import { describe, expect, it } from 'vitest';
import { isBusy, percent, summary, uploadReducer, type UploadAction, type UploadItem } from './upload-state';

const picked = uploadReducer([], {
  type: 'add',
  items: [
    { key: 'a', name: 'jar-morning.jpg', size: 1000, problem: null },
    { key: 'b', name: 'jar.heic', size: 500, problem: 'HEIC photos are not accepted yet' },
  ],
});
const item = (items: UploadItem[], key: string) => items.find((i) => i.key === key)!;

describe('the uploader’s list', () => {
  it('queues good files and marks refused ones with their reason', () => {
    expect(item(picked, 'a')).toMatchObject({ status: 'waiting', message: null });
    expect(item(picked, 'b')).toMatchObject({ status: 'refused', message: 'HEIC photos are not accepted yet' });
    expect(isBusy(picked)).toBe(true);
  });

  it('follows the upload’s progress, then waits on the server once every byte is sent', () => {
    let items = uploadReducer(picked, { type: 'start', key: 'a' });
    items = uploadReducer(items, { type: 'progress', key: 'a', sent: 400, total: 1200 });
    expect(item(items, 'a').status).toBe('sending');
    expect(percent(item(items, 'a'))).toBe(33);
    items = uploadReducer(items, { type: 'progress', key: 'a', sent: 1200, total: 1200 });
    expect(item(items, 'a').status).toBe('processing');
    expect(percent(item(items, 'a'))).toBe(100);
    items = uploadReducer(items, { type: 'done', key: 'a' });
    expect(isBusy(items)).toBe(false);
    expect(summary(items)).toBe('1 of 2 photos added · 1 could not be added');
  });

  it('offers a retry only after a failure that was not the file’s fault', () => {
    let items = uploadReducer(picked, { type: 'start', key: 'a' });
    items = uploadReducer(items, { type: 'failed', key: 'a', message: 'Only JPEG, PNG or WebP.', retryable: false });
    expect(item(uploadReducer(items, { type: 'retry', key: 'a' }), 'a').status).toBe('failed');

    items = uploadReducer(items, { type: 'failed', key: 'a', message: 'Could not be reached.', retryable: true });
    const retried = uploadReducer(items, { type: 'retry', key: 'a' });
    expect(item(retried, 'a')).toMatchObject({ status: 'waiting', sent: 0, message: null });
  });

  it('starts a new pick’s list without the last pick’s added and refused files', () => {
    let items = uploadReducer(picked, { type: 'start', key: 'a' });
    items = uploadReducer(items, { type: 'done', key: 'a' });
    items = uploadReducer(items, {
      type: 'add',
      items: [{ key: 'c', name: 'jar-peak.jpg', size: 900, problem: null }],
    });
    expect(items.map((i) => [i.key, i.status])).toEqual([['c', 'waiting']]);
    expect(summary(items)).toBe('0 of 1 photo added');
  });

  it('keeps a file still on its way, or worth retrying, when another pick comes', () => {
    const sending = uploadReducer(picked, { type: 'start', key: 'a' });
    const add: UploadAction = { type: 'add', items: [{ key: 'c', name: 'c.jpg', size: 9, problem: null }] };
    expect(uploadReducer(sending, add).map((i) => i.key)).toEqual(['a', 'c']);
    const offline = uploadReducer(sending, { type: 'failed', key: 'a', message: 'offline', retryable: true });
    expect(uploadReducer(offline, add).map((i) => i.key)).toEqual(['a', 'c']);
    const refused = uploadReducer(sending, { type: 'failed', key: 'a', message: 'Not an image', retryable: false });
    expect(uploadReducer(refused, add).map((i) => i.key)).toEqual(['c']);
  });

  it('drops a dismissed file and clears finished ones', () => {
    const done = uploadReducer(picked, { type: 'done', key: 'a' });
    expect(uploadReducer(done, { type: 'clear-finished' }).map((i) => i.key)).toEqual(['b']);
    expect(uploadReducer(done, { type: 'dismiss', key: 'b' }).map((i) => i.key)).toEqual(['a']);
  });

  it('shows 0 % for a file not yet started and says nothing when nothing was picked', () => {
    expect(percent(item(picked, 'a'))).toBe(0);
    expect(summary([])).toBeNull();
  });
});
