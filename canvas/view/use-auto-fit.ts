'use client';
import { useCallback, useEffect, useRef } from 'react';
import { fitToScene } from '../editor/actions';
import type { Editor } from '../editor/editor';
import type { EditorStore } from '../store/editor-store';

/**
 * A read-only plan (review, replay) that fits itself to its box, and fits again when the box changes size
 * (a tablet turned, a window resized, a panel opened) unless the viewer has zoomed or panned since the last
 * fit. Returns the fit, for a Fit button; pressing it hands the view back to the automatic fit.
 */
export function useAutoFit(ctx: { store: EditorStore; editor: Editor }): () => void {
  const auto = useRef(true);
  const fitting = useRef(false);
  const fit = useCallback(() => {
    fitting.current = true;
    fitToScene(ctx.editor);
    fitting.current = false;
    auto.current = true;
  }, [ctx]);
  useEffect(
    () =>
      ctx.store.subscribe((s, prev) => {
        if (s.viewport !== prev.viewport && auto.current) fit();
        else if (s.camera !== prev.camera && !fitting.current) auto.current = false;
      }),
    [ctx, fit],
  );
  useEffect(() => {
    const t = setTimeout(fit, 30);
    return () => clearTimeout(t);
  }, [fit]);
  return fit;
}
