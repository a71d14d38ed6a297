import type { Editor } from '../editor/editor';
import { useUsableAreaDraft } from './usable-area-store';

/** Ends the marking: three corners or more become the scene's usable area (one undo step). */
export function finishUsableArea(editor: Editor) {
  const { points, set } = useUsableAreaDraft.getState();
  if (points.length >= 3) editor.run((doc) => ({ document: { ...doc, usableArea: points.slice(0, 64) }, capture: 'commit' }));
  set({ drawing: false, points: [] });
}

export function clearUsableArea(editor: Editor) {
  editor.run((doc) => ({ document: { ...doc, usableArea: null }, capture: 'commit' }));
}
