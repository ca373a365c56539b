// Reads an uploaded photo's size and makes its thumbnail (sharp): turned upright by its EXIF
// orientation, fitted inside THUMBNAIL_MAX_PX, JPEG.
import sharp from 'sharp';

/** Longest side of a thumbnail, px. */
export const THUMBNAIL_MAX_PX = 320;
/** Largest photo decoded, in pixels (about 64 megapixels), so a small file cannot unpack into gigabytes. */
export const MAX_INPUT_PIXELS = 64_000_000;

export type Thumbnail =
  | { ok: true; width: number; height: number; thumbnail: Buffer; thumbnailWidth: number; thumbnailHeight: number }
  | { ok: false; reason: string };

export async function makeThumbnail(bytes: Buffer): Promise<Thumbnail> {
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' });
    const meta = await image.metadata();
    if (!meta.width || !meta.height) return { ok: false, reason: 'the image has no size' };
    // EXIF orientations 5–8 swap width and height once the photo is turned upright.
    const swap = (meta.orientation ?? 1) >= 5;
    const { data, info } = await sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS })
      .rotate()
      .resize({ width: THUMBNAIL_MAX_PX, height: THUMBNAIL_MAX_PX, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 80 })
      .toBuffer({ resolveWithObject: true });
    return {
      ok: true,
      width: swap ? meta.height : meta.width,
      height: swap ? meta.width : meta.height,
      thumbnail: data,
      thumbnailWidth: info.width,
      thumbnailHeight: info.height,
    };
  } catch (e) {
    return { ok: false, reason: (e as Error).message };
  }
}
