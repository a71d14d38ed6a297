'use client';
import { useRef } from 'react';

/** Where the drawer settles when let go, as shares of the editor's width: a third first. */
export const DRAWER_SNAPS = [1 / 3, 1 / 2, 2 / 3] as const;

export const nearestSnap = (share: number) => DRAWER_SNAPS.reduce((best, s) => (Math.abs(s - share) < Math.abs(best - share) ? s : best), DRAWER_SNAPS[0]);

/**
 * The grip on the drawer's left edge (tablets, phones): drag it to resize the drawer over the plan; on
 * release it snaps to a third, a half or two thirds of the width. ← and → step between those.
 */
export function DrawerGrip({ share, onResize }: { share: number | string; onResize(width: number | string): void }) {
  const drag = useRef<{ right: number; width: number } | null>(null);
  const parentWidth = (el: HTMLElement) => el.closest('[data-drawer-host]')?.getBoundingClientRect() ?? { right: window.innerWidth, width: window.innerWidth };
  const current = typeof share === 'number' ? share : DRAWER_SNAPS[0];
  return (
    <button
      type="button"
      aria-label="Resize the panel (it settles at a third, a half or two thirds of the width)"
      data-testid="drawer-grip"
      className="absolute inset-y-0 -left-3 z-10 flex w-6 cursor-ew-resize touch-none items-center justify-center lg:hidden"
      onPointerDown={(e) => {
        const host = parentWidth(e.currentTarget);
        drag.current = { right: host.right, width: host.width };
        e.currentTarget.setPointerCapture(e.pointerId);
      }}
      onPointerMove={(e) => {
        const d = drag.current;
        if (!d) return;
        onResize(`${Math.max(160, Math.min(d.width - 80, d.right - e.clientX))}px`);
      }}
      onPointerUp={(e) => {
        const d = drag.current;
        drag.current = null;
        if (d) onResize(nearestSnap((d.right - e.clientX) / d.width));
      }}
      onKeyDown={(e) => {
        const i = DRAWER_SNAPS.indexOf(nearestSnap(current));
        if (e.key === 'ArrowLeft') onResize(DRAWER_SNAPS[Math.min(DRAWER_SNAPS.length - 1, i + 1)]);
        if (e.key === 'ArrowRight') onResize(DRAWER_SNAPS[Math.max(0, i - 1)]);
      }}
    >
      <span aria-hidden className="h-14 w-1.5 rounded-full bg-ink-muted" />
    </button>
  );
}
