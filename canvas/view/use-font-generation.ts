'use client';
import { useEffect, useState } from 'react';
import { clearTextWidths } from '../overlays/measure-text';

/**
 * Counts web-font loads. Konva measures a text once, when it is made; one made before Inter Tight arrived
 * keeps the fallback face's width, and its pill no longer fits the text drawn later. Layers are keyed by
 * this count, so their texts are made (and measured) again once the font is in.
 */
export function useFontGeneration(): number {
  const [gen, setGen] = useState(0);
  useEffect(() => {
    if (typeof document === 'undefined' || !document.fonts) return;
    let live = true;
    const bump = () => {
      if (!live) return;
      clearTextWidths();
      setGen((g) => g + 1);
    };
    // Canvas text does not make the browser fetch a face's other character ranges (primes for feet and
    // inches, the degree sign); ask for them, then measure again.
    const sample = 'Aa0 ′″°–·×—';
    void Promise.all(['600 12px', '600 13px', '400 14px'].map((f) => document.fonts.load(`${f} "Inter Tight"`, sample)))
      .catch(() => undefined)
      .then(() => document.fonts.ready)
      .then(bump);
    document.fonts.addEventListener('loadingdone', bump);
    return () => {
      live = false;
      document.fonts.removeEventListener('loadingdone', bump);
    };
  }, []);
  return gen;
}
