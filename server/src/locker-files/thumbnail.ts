import sharp from 'sharp';

/** Longest edge of a thumbnail, in pixels: sharp enough for a table row or a card at 2× density. */
export const thumbnailEdgePx = 320;

/** WebP quality of thumbnails (0–100): small files, no visible blocking at thumbnail size. */
export const thumbnailWebpQuality = 75;

/**
 * Largest photo decoded for a thumbnail, in pixels (width × height): 50 megapixels covers any phone or
 * camera photo, and refuses "decompression bombs" (a tiny file that decodes to gigabytes).
 */
export const maxPhotoPixels = 50_000_000;

/** Content type of every thumbnail. */
export const thumbnailContentType = 'image/webp';

/**
 * A small WebP of a photo: turned upright by its EXIF orientation, fitted inside
 * {@link thumbnailEdgePx} × {@link thumbnailEdgePx} (never enlarged), metadata (GPS and all) dropped.
 * Throws when the bytes do not decode as an image or exceed {@link maxPhotoPixels}.
 */
export async function makeThumbnail(photo: Buffer): Promise<Buffer> {
  return sharp(photo, { limitInputPixels: maxPhotoPixels, failOn: 'error' })
    .rotate()
    .resize(thumbnailEdgePx, thumbnailEdgePx, { fit: 'inside', withoutEnlargement: true })
    .webp({ quality: thumbnailWebpQuality })
    .toBuffer();
}
