import { fitWithin, makeThumbnail, photoProblem } from './photo-thumbnail';

describe('tub photo helpers', () => {
  it('refuses what the server would refuse, saying why', () => {
    expect(photoProblem({ name: 'tub.jpg', type: 'image/jpeg', size: 1000 })).toBeNull();
    expect(photoProblem({ name: 'tub.heic', type: 'image/heic', size: 1000 })).toBe('tub.heic is not a JPEG, PNG, GIF or WebP image.');
    expect(photoProblem({ name: 'big.png', type: 'image/png', size: 5 * 1024 * 1024 + 1 })).toBe('big.png is larger than 5 MB.');
  });

  it('scales the longer side down to 320 px, never up', () => {
    expect(fitWithin(4000, 3000)).toEqual({ width: 320, height: 240 });
    expect(fitWithin(1080, 1920)).toEqual({ width: 180, height: 320 });
    expect(fitWithin(200, 100)).toEqual({ width: 200, height: 100 });
  });

  it('gives up quietly where the browser cannot draw (the upload then goes without a thumbnail)', async () => {
    // jsdom has no canvas drawing and no createImageBitmap.
    expect(await makeThumbnail(new Blob([new Uint8Array([1, 2, 3])], { type: 'image/png' }))).toBeNull();
  });
});
