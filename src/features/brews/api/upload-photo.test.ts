import { describe, expect, it } from 'vitest';
import { PHOTO_MAX_BYTES } from '@shared/schemas/brews';
import { photoProblem } from './upload-photo';

// The server's own limits (server/brews/photos.ts, decision 0006): 5 MB, JPEG, PNG or WebP.
describe('photo limits checked on the device before a photo waits in the queue', () => {
  it('takes a photo at the limit and refuses one a byte over', () => {
    expect(photoProblem(new Blob([new Uint8Array(PHOTO_MAX_BYTES)], { type: 'image/jpeg' }))).toBeNull();
    expect(photoProblem(new Blob([new Uint8Array(PHOTO_MAX_BYTES + 1)], { type: 'image/jpeg' }))).toMatch(/larger than 5 MB/);
  });

  it('refuses a file the browser says is not a JPEG, PNG or WebP image', () => {
    expect(photoProblem(new Blob(['GIF89a'], { type: 'image/gif' }))).toMatch(/not a JPEG, PNG or WebP/);
    expect(photoProblem(new Blob(['x'], { type: 'image/webp' }))).toBeNull();
  });
});
