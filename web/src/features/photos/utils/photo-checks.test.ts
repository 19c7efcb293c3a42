import { PHOTO_MAX_BYTES, PHOTOS_MAX_PER_REQUEST } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { checkFile, checkPick, formatBytes } from './photo-checks';

const jpeg = (size = 2_000_000, name = 'jar.jpg') => ({ name, size, type: 'image/jpeg' });

describe('checking picked photos before sending', () => {
  it('lets JPEG, PNG and WebP up to the limit through', () => {
    for (const type of ['image/jpeg', 'image/png', 'image/webp']) {
      expect(checkFile({ name: 'x', size: PHOTO_MAX_BYTES, type }).problem).toBeNull();
    }
  });

  it('refuses a file one byte over the limit, saying the limit', () => {
    const problem = checkFile(jpeg(PHOTO_MAX_BYTES + 1)).problem;
    expect(problem).toContain('at most 15 MB');
    expect(problem).toContain('15.0 MB');
  });

  it('refuses other types, with a hint for HEIC from an iPhone', () => {
    expect(checkFile({ name: 'crumb.gif', size: 10, type: 'image/gif' }).problem).toMatch(/only JPEG, PNG or WebP/);
    expect(checkFile({ name: 'logo.svg', size: 10, type: 'image/svg+xml' }).problem).toMatch(/only JPEG/);
    expect(checkFile({ name: 'IMG_1.HEIC', size: 10, type: 'image/heic' }).problem).toMatch(/HEIC.*Most Compatible/);
  });

  it('leaves a file without a browser type to the server, which reads its bytes', () => {
    expect(checkFile({ name: 'photo', size: 10, type: '' }).problem).toBeNull();
  });

  it('refuses an empty file', () => {
    expect(checkFile(jpeg(0)).problem).toBe('This file is empty.');
  });

  it('takes up to the per-request count and refuses the whole pick beyond it', () => {
    const many = Array.from({ length: PHOTOS_MAX_PER_REQUEST }, (_, i) => jpeg(1000, `${i}.jpg`));
    const ok = checkPick(many);
    expect(ok.problem).toBeNull();
    expect(ok.files).toHaveLength(PHOTOS_MAX_PER_REQUEST);
    const tooMany = checkPick([...many, jpeg()]);
    expect(tooMany.problem).toBe(
      `${PHOTOS_MAX_PER_REQUEST + 1} photos picked: add at most ${PHOTOS_MAX_PER_REQUEST} at a time.`,
    );
    expect(tooMany.files).toEqual([]);
  });

  it('keeps the good files of a mixed pick and names the bad one', () => {
    const pick = checkPick([jpeg(), { name: 'notes.pdf', size: 5, type: 'application/pdf' }]);
    expect(pick.files.map((f) => f.problem === null)).toEqual([true, false]);
  });

  it('shows sizes in binary units, the limit’s own', () => {
    expect(formatBytes(PHOTO_MAX_BYTES)).toBe('15.0 MB');
    expect(formatBytes(3.5 * 1024 * 1024)).toBe('3.5 MB');
    expect(formatBytes(820 * 1024)).toBe('820 kB');
    expect(formatBytes(10)).toBe('1 kB');
  });
});
