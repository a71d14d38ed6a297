import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Font } from '@react-pdf/renderer';
import { woffToSfnt } from './woff-to-sfnt';

/**
 * Inter Tight from the app's own @fontsource package (nothing downloaded). The .woff files, not .woff2:
 * with .woff2 the renderer embeds the glyphs but draws them invisibly.
 */
let registered = false;

export const PDF_FONT = 'Inter Tight';

export function registerPdfFonts(): void {
  if (registered) return;
  const woff = (w: number) => readFileSync(path.join(process.cwd(), 'node_modules/@fontsource/inter-tight/files', `inter-tight-latin-${w}-normal.woff`));
  // Handed over unwrapped, as a data URL: see ./woff-to-sfnt for why.
  const file = (w: number) => `data:font/ttf;base64,${woffToSfnt(woff(w)).toString('base64')}`;
  Font.register({
    family: PDF_FONT,
    fonts: [
      { src: file(400), fontWeight: 400 },
      { src: file(600), fontWeight: 600 },
      { src: file(700), fontWeight: 700 },
    ],
  });
  // Words are wrapped whole (the default hyphenation splits trade words oddly), except a run too long for any
  // column (a pasted reference, a URL), which may break every 12 characters rather than run off the page.
  Font.registerHyphenationCallback((word) => (word.length <= 24 ? [word] : word.match(/.{1,12}/g) ?? [word]));
  registered = true;
}
