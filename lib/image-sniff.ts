/**
 * Identifies an uploaded image by its first bytes, never by its name or the browser's claimed type.
 * Signatures: PNG (ISO/IEC 15948 §5.2), JPEG (ITU-T T.81 Annex B: SOI marker FFD8 then a marker),
 * WebP (RIFF container with form type "WEBP", Google's WebP container specification).
 */

export type ImageMime = 'image/png' | 'image/jpeg' | 'image/webp';

export const ACCEPTED_IMAGE_TYPES: readonly ImageMime[] = ['image/png', 'image/jpeg', 'image/webp'];

export interface SniffedImage {
  mime: ImageMime;
  /** Pixel size when the header gives it cheaply; null otherwise. */
  width: number | null;
  height: number | null;
}

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

const ascii = (b: Uint8Array, at: number, text: string) => {
  if (b.length < at + text.length) return false;
  for (let i = 0; i < text.length; i++) if (b[at + i] !== text.charCodeAt(i)) return false;
  return true;
};

const u16be = (b: Uint8Array, at: number) => (b[at] << 8) | b[at + 1];
const u32be = (b: Uint8Array, at: number) => ((b[at] << 24) >>> 0) + (b[at + 1] << 16) + (b[at + 2] << 8) + b[at + 3];
const u16le = (b: Uint8Array, at: number) => b[at] | (b[at + 1] << 8);
const u24le = (b: Uint8Array, at: number) => b[at] | (b[at + 1] << 8) | (b[at + 2] << 16);

function pngSize(b: Uint8Array): [number, number] | null {
  // The first chunk must be IHDR: width and height are its first two 4-byte fields.
  if (b.length < 24 || !ascii(b, 12, 'IHDR')) return null;
  return [u32be(b, 16), u32be(b, 20)];
}

function jpegSize(b: Uint8Array): [number, number] | null {
  let i = 2;
  while (i + 9 < b.length) {
    if (b[i] !== 0xff) return null;
    const marker = b[i + 1];
    if (marker === 0xff) {
      i += 1; // fill byte
      continue;
    }
    // SOF0..SOF15 carry the frame size, except DHT (C4), JPG (C8) and DAC (CC).
    if (marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc) {
      return [u16be(b, i + 7), u16be(b, i + 5)];
    }
    if (marker === 0xd9 || marker === 0xda) return null; // end of image / start of scan before any frame header
    i += 2 + u16be(b, i + 2);
  }
  return null;
}

function webpSize(b: Uint8Array): [number, number] | null {
  if (ascii(b, 12, 'VP8 ') && b.length >= 30 && b[23] === 0x9d && b[24] === 0x01 && b[25] === 0x2a) {
    return [u16le(b, 26) & 0x3fff, u16le(b, 28) & 0x3fff];
  }
  if (ascii(b, 12, 'VP8L') && b.length >= 25 && b[20] === 0x2f) {
    const bits = (b[21] | (b[22] << 8) | (b[23] << 16) | (b[24] << 24)) >>> 0;
    return [(bits & 0x3fff) + 1, ((bits >>> 14) & 0x3fff) + 1];
  }
  if (ascii(b, 12, 'VP8X') && b.length >= 30) return [u24le(b, 24) + 1, u24le(b, 27) + 1];
  return null;
}

/** The image type these bytes start with, if it is one we accept; null for anything else (GIF, text, PDF...). */
export function sniffImage(bytes: Uint8Array): SniffedImage | null {
  const b = bytes;
  const pick = (mime: ImageMime, size: [number, number] | null): SniffedImage => ({ mime, width: size?.[0] ?? null, height: size?.[1] ?? null });
  if (b.length >= 8 && PNG_SIGNATURE.every((v, i) => b[i] === v)) return pick('image/png', pngSize(b));
  if (b.length >= 4 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return pick('image/jpeg', jpegSize(b));
  if (b.length >= 16 && ascii(b, 0, 'RIFF') && ascii(b, 8, 'WEBP')) return pick('image/webp', webpSize(b));
  return null;
}
