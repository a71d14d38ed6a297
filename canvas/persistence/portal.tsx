'use client';

import { useEffect, useState } from 'react';
import { createPortal } from 'react-dom';

/**
 * Renders dialogs at the end of <body>, so they show even when the panel that opened them is hidden
 * (the editor's side panel is display:none on narrow screens until asked for).
 */
export function BodyPortal({ children }: { children: React.ReactNode }) {
  const [el, setEl] = useState<HTMLElement | null>(null);
  useEffect(() => setEl(document.body), []);
  return el ? createPortal(children, el) : null;
}
