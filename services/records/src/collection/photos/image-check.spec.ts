import { describe, expect, it } from 'vitest';
import { sniffImage } from './image-check.js';

describe('image sniffing', () => {
  it('recognises JPEG, PNG, GIF and WebP by their signatures', () => {
    expect(sniffImage(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 0]))?.type).toBe('image/jpeg'); // JFIF SOI marker FF D8 FF
    expect(sniffImage(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0]))?.type).toBe('image/png'); // PNG spec, 5.2 signature
    expect(sniffImage(Buffer.from('GIF89a....'))?.ext).toBe('gif');
    expect(sniffImage(Buffer.from('RIFF\0\0\0\0WEBPVP8 '))?.ext).toBe('webp');
  });

  it('refuses anything else, whatever its name', () => {
    expect(sniffImage(Buffer.from('%PDF-1.7 not an image'))).toBeNull();
    expect(sniffImage(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'))).toBeNull();
    expect(sniffImage(Buffer.alloc(0))).toBeNull();
  });
});
