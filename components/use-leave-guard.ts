'use client';

import { useEffect } from 'react';

export const LEAVE_MESSAGE = 'You have changes that are not saved. Leave this page without saving them?';

/**
 * While `dirty`, asks before the user leaves: the browser's own prompt on reload, close or a typed address
 * (beforeunload), and a confirm on any in-app link (caught in the capture phase, before Next's Link routes).
 * Links to the same page's sections, new tabs and downloads pass.
 */
export function useLeaveGuard(dirty: boolean, message = LEAVE_MESSAGE) {
  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      // Older Chromium needs returnValue set to show the prompt.
      e.returnValue = '';
    };
    const onClick = (e: MouseEvent) => {
      if (e.defaultPrevented || e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey) return;
      const a = e.target instanceof Element ? e.target.closest<HTMLAnchorElement>('a[href]') : null;
      if (!a || (a.target && a.target !== '_self') || a.hasAttribute('download')) return;
      const to = new URL(a.href, window.location.href);
      const here = window.location;
      if (to.origin === here.origin && to.pathname === here.pathname && to.search === here.search) return;
      if (!window.confirm(message)) {
        e.preventDefault();
        e.stopPropagation();
      }
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    document.addEventListener('click', onClick, true);
    return () => {
      window.removeEventListener('beforeunload', onBeforeUnload);
      document.removeEventListener('click', onClick, true);
    };
  }, [dirty, message]);
}
