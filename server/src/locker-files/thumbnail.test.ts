import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { makeThumbnail, maxPhotoPixels, thumbnailEdgePx } from './thumbnail';

const photo = (width: number, height: number, format: 'jpeg' | 'png' | 'webp' = 'jpeg') =>
  sharp({ create: { width, height, channels: 3, background: '#7a5c3e' } })
    .toFormat(format)
    .toBuffer();

describe('makeThumbnail', () => {
  it('fits a landscape photo inside the edge, keeping its aspect ratio, as WebP', async () => {
    const meta = await sharp(await makeThumbnail(await photo(1600, 1200))).metadata();
    expect(meta.format).toBe('webp');
    expect(meta.width).toBe(thumbnailEdgePx);
    expect(meta.height).toBe(240);
  });

  it('never enlarges a small photo', async () => {
    const meta = await sharp(await makeThumbnail(await photo(40, 30, 'png'))).metadata();
    expect([meta.width, meta.height]).toEqual([40, 30]);
  });

  it('turns a photo upright by its EXIF orientation and drops the metadata', async () => {
    // Orientation 6 = "rotate 90° clockwise to view" (EXIF 2.32, CIPA DC-008-2019, tag 0x0112).
    const tagged = await sharp({ create: { width: 400, height: 200, channels: 3, background: '#223344' } })
      .jpeg()
      .withMetadata({ orientation: 6 })
      .toBuffer();
    const thumb = await sharp(await makeThumbnail(tagged)).metadata();
    expect([thumb.width, thumb.height]).toEqual([160, 320]);
    expect(thumb.orientation).toBeUndefined();
    expect(thumb.exif).toBeUndefined();
  });

  it('refuses bytes that are not an image, and images over the pixel limit', async () => {
    await expect(makeThumbnail(Buffer.from('%PDF-1.7\n%%EOF\n'))).rejects.toThrow();
    const side = Math.ceil(Math.sqrt(maxPhotoPixels)) + 1;
    // A PNG of one colour compresses to a few kB but would decode to ~150 MB.
    const bomb = await sharp({ create: { width: side, height: side, channels: 3, background: '#000000' } })
      .png({ compressionLevel: 9 })
      .toBuffer();
    expect(bomb.length).toBeLessThan(1_000_000);
    await expect(makeThumbnail(bomb)).rejects.toThrow(/pixel limit/i);
  });
});
