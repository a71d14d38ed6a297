import { describe, expect, it } from 'vitest';
import { sniffImage } from '@/lib/image-sniff';
import { makeGifHeader, makeJpegHeader, makePng, makeWebpLosslessHeader } from '@/tests/fixtures/images';

// Signatures and header layouts: PNG ISO/IEC 15948 §5.2 and §11.2.2 (IHDR); JPEG ITU-T T.81 Annex B;
// WebP: Google's "WebP Container Specification" (RIFF/WEBP, VP8L signature 0x2F, 14-bit sizes minus one).
describe('sniffImage', () => {
  it('accepts a PNG and reads its size from IHDR', () => {
    expect(sniffImage(makePng(37, 21))).toEqual({ mime: 'image/png', width: 37, height: 21 });
  });

  it('accepts a JPEG and reads its size from the SOF0 frame header', () => {
    expect(sniffImage(makeJpegHeader(640, 480))).toEqual({ mime: 'image/jpeg', width: 640, height: 480 });
  });

  it('accepts a lossless WebP and reads its size from the VP8L header', () => {
    expect(sniffImage(makeWebpLosslessHeader(1024, 768))).toEqual({ mime: 'image/webp', width: 1024, height: 768 });
  });

  it('refuses a text file whatever it is called', () => {
    const namedPng = new File(['this is not an image, only named like one'], 'site.png', { type: 'image/png' });
    return namedPng.arrayBuffer().then((buf) => expect(sniffImage(new Uint8Array(buf))).toBeNull());
  });

  it('refuses GIF, a real image type outside the accepted three', () => {
    expect(sniffImage(makeGifHeader(10, 10))).toBeNull();
  });

  it('refuses a RIFF file that is not WebP (a WAV header) and a truncated PNG signature', () => {
    const wav = Buffer.concat([Buffer.from('RIFF'), Buffer.alloc(4), Buffer.from('WAVEfmt '), Buffer.alloc(8)]);
    expect(sniffImage(wav)).toBeNull();
    expect(sniffImage(makePng(4, 4).subarray(0, 6))).toBeNull();
  });
});
