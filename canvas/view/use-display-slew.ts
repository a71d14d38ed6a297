'use client';
import { useEditorState } from '../editor-context';
import type { TruckObject } from '@/lib/scene/objects';

/** The slew the view shows: a read-only viewer's scrub, else the document's. */
export function useDisplaySlew(): number | null {
  return useEditorState((s) => {
    const t = s.document.objects.find((o): o is TruckObject => o.kind === 'truck');
    return t ? (s.scrubSlew ?? t.boom.slew) : null;
  });
}
