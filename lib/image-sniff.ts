import { imageSize } from 'image-size';

/**
 * Identifies an uploaded image by decoding its header with image-size, never by its name, the browser's
 * claimed type or a bare signature: a file must carry a readable header with its pixel size (PNG's IHDR,
 * ISO/IEC 15948 §11.2.2; JPEG's SOF frame header, ITU-T T.81 Annex B; WebP's VP8/VP8L/VP8X header).
 */

export type ImageMime = 'image/png' | 'image/jpeg' | 'image/webp';

export const ACCEPTED_IMAGE_TYPES: readonly ImageMime[] = ['image/png', 'image/jpeg', 'image/webp'];

/**
 * Largest image accepted, per side and in total. 16,384 px is the largest canvas side browsers draw
 * reliably (Chromium's and Firefox's limit); 50 megapixels decodes to 200 MB of RGBA in the editor,
 * already more than a site photo or an aerial tile needs.
 */
export const MAX_IMAGE_SIDE_PX = 16_384;
export const MAX_IMAGE_PIXELS = 50_000_000;

export interface SniffedImage {
  mime: ImageMime;
  width: number;
  height: number;
}

const MIME: Record<string, ImageMime> = { png: 'image/png', jpg: 'image/jpeg', webp: 'image/webp' };

/** The image's type and size when its header decodes as PNG, JPEG or WebP; null for anything else. */
export function sniffImage(bytes: Uint8Array): SniffedImage | null {
  try {
    const { type, width, height } = imageSize(bytes);
    const mime = type ? MIME[type] : undefined;
    if (!mime || !width || !height) return null;
    return { mime, width, height };
  } catch {
    // image-size throws on a truncated or corrupt header ("Invalid PNG", "Corrupt JPG").
    return null;
  }
}

/** Why these dimensions are refused, or null when they are within the limits. */
export function oversizedImageReason(image: SniffedImage): string | null {
  if (image.width > MAX_IMAGE_SIDE_PX || image.height > MAX_IMAGE_SIDE_PX) {
    return `the image is ${image.width} × ${image.height} px; each side may be at most ${MAX_IMAGE_SIDE_PX.toLocaleString('en-US')} px`;
  }
  if (image.width * image.height > MAX_IMAGE_PIXELS) {
    return `the image has ${((image.width * image.height) / 1e6).toFixed(1)} megapixels; at most ${MAX_IMAGE_PIXELS / 1e6} are accepted`;
  }
  return null;
}
