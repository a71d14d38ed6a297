'use client';
import { useEditorState } from '../editor-context';
import { overlayGeometry } from '../analysis/overlay-geometry';

export function useOverlayGeometry() {
  const analysis = useEditorState((s) => s.analysis);
  const doc = useEditorState((s) => s.document);
  const model = useEditorState((s) => s.truck);
  return overlayGeometry(analysis, doc, model);
}
