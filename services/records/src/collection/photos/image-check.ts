/** Image types we keep, recognised by their first bytes (a browser's content type can be wrong). */
const SIGNATURES: { type: string; ext: string; test: (b: Buffer) => boolean }[] = [
  { type: 'image/jpeg', ext: 'jpg', test: (b) => b.length > 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff },
  { type: 'image/png', ext: 'png', test: (b) => b.length > 8 && b.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) },
  { type: 'image/gif', ext: 'gif', test: (b) => b.length > 6 && /^GIF8[79]a$/.test(b.subarray(0, 6).toString('latin1')) },
  { type: 'image/webp', ext: 'webp', test: (b) => b.length > 12 && b.subarray(0, 4).toString('latin1') === 'RIFF' && b.subarray(8, 12).toString('latin1') === 'WEBP' },
];

export const IMAGE_TYPES = SIGNATURES.map((s) => s.type);
export const MAX_PHOTO_BYTES = 5 * 1024 * 1024;

export function sniffImage(bytes: Buffer): { type: string; ext: string } | null {
  const found = SIGNATURES.find((s) => s.test(bytes));
  return found ? { type: found.type, ext: found.ext } : null;
}
