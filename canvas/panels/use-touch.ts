'use client';
import { useSyncExternalStore } from 'react';

/** A coarse pointer (a finger) as the main input: hints then say "tap" instead of naming keys. */
const QUERY = '(pointer: coarse)';

function subscribe(onChange: () => void) {
  const m = window.matchMedia(QUERY);
  m.addEventListener('change', onChange);
  return () => m.removeEventListener('change', onChange);
}

export function useTouch(): boolean {
  return useSyncExternalStore(subscribe, () => window.matchMedia(QUERY).matches, () => false);
}

/** A hint without its keyboard shortcuts ("Place the truck (T)" → "Place the truck") on a touch screen. */
export const touchHint = (text: string, touch: boolean) => (touch ? text.replace(/\s\((?:[A-Z?]|Ctrl [^)]*)\)/g, '') : text);
