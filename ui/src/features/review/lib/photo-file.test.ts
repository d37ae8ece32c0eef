import { describe, expect, it } from 'vitest';
import { formatBytes, photoFileProblem, PHOTO_MAX_BYTES } from './photo-file';

describe('photoFileProblem', () => {
  it('accepts JPEG, PNG and WebP up to 15 MB, and files without a type (the server checks the content)', () => {
    expect(photoFileProblem({ size: 1000, type: 'image/jpeg' })).toBeNull();
    expect(photoFileProblem({ size: 1000, type: 'image/png' })).toBeNull();
    expect(photoFileProblem({ size: PHOTO_MAX_BYTES, type: 'image/webp' })).toBeNull();
    expect(photoFileProblem({ size: 1000, type: '' })).toBeNull();
  });

  it('refuses empty, oversized and other files with a reason', () => {
    expect(photoFileProblem({ size: 0, type: 'image/jpeg' })).toMatch(/empty/);
    expect(photoFileProblem({ size: PHOTO_MAX_BYTES + 1, type: 'image/jpeg' })).toMatch(/limit is 15 MB/);
    expect(photoFileProblem({ size: 1000, type: 'image/gif' })).toMatch(/Only JPEG, PNG and WebP/);
    expect(photoFileProblem({ size: 1000, type: 'image/heic' })).toMatch(/HEIC/);
  });

  it('formats sizes', () => {
    expect(formatBytes(2.5 * 1024 * 1024)).toBe('2.5 MB');
    expect(formatBytes(830 * 1024)).toBe('830 kB');
  });
});
