/** What the server accepts (it checks again by the file's bytes). */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/gif', 'image/webp'];
export const MAX_PHOTO_BYTES = 5 * 1024 * 1024;
/** The server refuses a larger thumbnail; a 320 px JPEG is far below it. */
const MAX_THUMBNAIL_BYTES = 256 * 1024;
const THUMBNAIL_PX = 320;

/** Why a chosen file cannot be a photo, in words for the person who chose it; null when it may be sent. */
export function photoProblem(file: { name: string; type: string; size: number }): string | null {
  if (!PHOTO_TYPES.includes(file.type)) return `${file.name} is not a JPEG, PNG, GIF or WebP image.`;
  if (file.size > MAX_PHOTO_BYTES) return `${file.name} is larger than 5 MB.`;
  return null;
}

/** Width and height that fit within `max` pixels on the longer side, never enlarged. */
export function fitWithin(width: number, height: number, max = THUMBNAIL_PX): { width: number; height: number } {
  const scale = Math.min(1, max / Math.max(width, height, 1));
  return { width: Math.max(1, Math.round(width * scale)), height: Math.max(1, Math.round(height * scale)) };
}

/**
 * A small JPEG copy for lists, drawn in the browser (the server has no image library). Null when
 * the browser cannot decode the file or draw it: the upload then goes without one.
 */
export async function makeThumbnail(file: Blob, doc: Document = document): Promise<Blob | null> {
  try {
    if (typeof createImageBitmap !== 'function') return null;
    const bitmap = await createImageBitmap(file);
    const size = fitWithin(bitmap.width, bitmap.height);
    const canvas = doc.createElement('canvas');
    canvas.width = size.width;
    canvas.height = size.height;
    const context = canvas.getContext('2d');
    if (!context) return null;
    // JPEG has no transparency: a white ground rather than black behind a PNG's clear parts.
    context.fillStyle = '#fff';
    context.fillRect(0, 0, size.width, size.height);
    context.drawImage(bitmap, 0, 0, size.width, size.height);
    bitmap.close();
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/jpeg', 0.82));
    return blob && blob.size <= MAX_THUMBNAIL_BYTES ? blob : null;
  } catch {
    return null;
  }
}
