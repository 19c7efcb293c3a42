import { describe, expect, it } from 'vitest';
import { photosPath } from '../api/query-keys';
import { uploadErrorMessage, worthRetrying } from './upload-errors';

describe('a refused upload, in words', () => {
  it('keeps the server’s own reason when it gave one', () => {
    const said = '“notes.jpg” is not an image we can read: send a JPEG, PNG or WebP photo.';
    expect(uploadErrorMessage(415, said)).toBe(said);
  });

  it('says what the status means when the answer had no body (a proxy’s bare 413)', () => {
    expect(uploadErrorMessage(413, null)).toBe('Too large: each photo may be at most 15 MB, 10 at a time.');
    expect(uploadErrorMessage(415, null)).toMatch(/only JPEG, PNG or WebP/);
    expect(uploadErrorMessage(422, null)).toMatch(/too many pixels/);
    expect(uploadErrorMessage(0, null)).toMatch(/could not be reached/);
  });

  it('offers to send again only when the connection or the server failed, not the file', () => {
    expect([0, 502, 503].map(worthRetrying)).toEqual([true, true, true]);
    expect([413, 415, 422, 404].map(worthRetrying)).toEqual([false, false, false, false]);
  });

  it('sends each log’s photos to its own route', () => {
    expect(photosPath({ type: 'feeding', id: 'f1' })).toBe('/feedings/f1/photos');
    expect(photosPath({ type: 'rise-check', id: 'r1' })).toBe('/rise-checks/r1/photos');
    expect(photosPath({ type: 'bake-plan', id: 'p1' })).toBe('/plans/p1/photos');
    expect(photosPath({ type: 'culture', id: 'c1' })).toBe('/cultures/c1/photos');
  });
});
