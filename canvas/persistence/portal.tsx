'use client';

import { useSyncExternalStore } from 'react';
import { createPortal } from 'react-dom';

const noSubscription = () => () => {};

/**
 * Renders dialogs at the end of <body>, so they show even when the panel that opened them is hidden
 * (the editor's side panel is display:none on narrow screens until asked for).
 */
export function BodyPortal({ children }: { children: React.ReactNode }) {
  // No <body> to portal into on the server: render nothing there and on the hydrating pass.
  const inBrowser = useSyncExternalStore(noSubscription, () => true, () => false);
  return inBrowser ? createPortal(children, document.body) : null;
}
