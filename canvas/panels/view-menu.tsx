'use client';
import { useEffect, useRef, useState } from 'react';
import { ToolButton } from './button';

interface Props {
  className?: string;
  zoom: number;
  /** Snap on or off; null where the plan cannot be edited (no snapping to offer). */
  snap: boolean | null;
  onSnap: () => void;
  onZoom: (factor: number) => void;
  onFit: () => void;
  onHelp: () => void;
}

/**
 * The editor's view controls gathered in one menu for tablet widths: zoom, fit, snapping and the help on
 * gestures. Labelled in words (a tablet has no hover titles); closes on a choice, Escape or a tap outside.
 */
export function ViewMenu({ className = '', zoom, snap, onSnap, onZoom, onFit, onHelp }: Props) {
  const [open, setOpen] = useState(false);
  const root = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!open) return;
    const away = (e: PointerEvent) => {
      if (!root.current?.contains(e.target as Node)) setOpen(false);
    };
    const esc = (e: KeyboardEvent) => e.key === 'Escape' && setOpen(false);
    document.addEventListener('pointerdown', away);
    document.addEventListener('keydown', esc);
    return () => {
      document.removeEventListener('pointerdown', away);
      document.removeEventListener('keydown', esc);
    };
  }, [open]);
  const item = 'flex min-h-11 w-full items-center justify-between gap-3 rounded-md px-3 text-left text-sm font-medium hover:bg-paper-sunk';
  const then = (f: () => void, close = true) => () => {
    f();
    if (close) setOpen(false);
  };
  return (
    <div ref={root} className={`relative ${className}`}>
      <ToolButton aria-expanded={open} aria-haspopup="menu" onClick={() => setOpen(!open)} data-testid="view-menu">
        View ▾
      </ToolButton>
      {open && (
        <div role="menu" aria-label="View" className="absolute right-0 top-full z-30 mt-1 w-56 rounded-md border border-paper-line bg-paper-raised p-1 shadow-lift">
          <p className="px-3 py-1 text-caption text-ink-muted tabular-nums">Zoom {zoom}%</p>
          <button type="button" role="menuitem" className={item} onClick={then(() => onZoom(1.25), false)}>
            Zoom in <span aria-hidden>+</span>
          </button>
          <button type="button" role="menuitem" className={item} onClick={then(() => onZoom(0.8), false)}>
            Zoom out <span aria-hidden>−</span>
          </button>
          <button type="button" role="menuitem" className={item} onClick={then(onFit)}>
            Fit the scene
          </button>
          {snap !== null && (
            <button type="button" role="menuitemcheckbox" aria-checked={snap} className={item} onClick={then(onSnap)}>
              Snap to grid <span aria-hidden>{snap ? '✓ on' : 'off'}</span>
            </button>
          )}
          <button type="button" role="menuitem" className={item} onClick={then(onHelp)}>
            Gestures and keys
          </button>
        </div>
      )}
    </div>
  );
}
