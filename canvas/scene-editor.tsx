'use client';
import { useEffect, useMemo, useState } from 'react';
import { createEditorStore } from './store/editor-store';
import type { Editor } from './editor/editor';
import { createEditor } from './editor/create-editor';
import { EditorContext } from './editor-context';
import { PlanView } from './view/plan-view';
import { ToolRail } from './panels/tool-rail';
import { TopBar } from './panels/top-bar';
import { SidePanel } from './panels/side-panel';
import { SlewScrubber } from './panels/slew-scrubber';
import { ScaleBar } from './view/scale-bar';
import { UsableAreaLayer } from './advisor/usable-area-layer';
import { ReachEnvelopeToggle } from './overlays/reach-envelope-toggle';
import { HelpSheet } from './panels/help-sheet';
import { fitToScene } from './editor/actions';
import { attachLiveAnalysis } from './analysis/live-analysis';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';
import type { UnitSystem } from '@/lib/units';
import type { EditorStore } from './store/editor-store';
import type { EditorReviewData } from '@/lib/review/page-data';
import { EditorReview } from './review/editor-review';

export interface SceneEditorProps {
  scene: { id: number; title: string; status: string; revision: number; ownerName: string; updatedAt: string };
  document: SceneDocument;
  profiles: TruckProfileInput[];
  readOnly: boolean;
  units: UnitSystem;
  user: { name: string; role: string };
  /** The review desk's status, comments and actions (canvas/review). */
  review?: EditorReviewData;
  /** Lets the page's other parts (saving, export) reach the store. */
  onStore?: (store: EditorStore) => void;
}

declare global {
  interface Window {
    /** For tests and the bench: the live editor store. */
    __arclineEditor?: { store: EditorStore; editor: Editor };
  }
}

const typing = (t: EventTarget | null) => t instanceof HTMLElement && (t.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(t.tagName));

export function SceneEditor(props: SceneEditorProps) {
  const [ctx] = useState(() => {
    const store = createEditorStore({ sceneId: props.scene.id, document: props.document, revision: props.scene.revision, readOnly: props.readOnly, units: props.units, profiles: props.profiles });
    return { store, editor: createEditor(store) };
  });
  const value = useMemo(() => ctx, [ctx]);

  useEffect(() => {
    window.__arclineEditor = ctx;
    // The full swing analysis waits a moment so a release paints first; snapshots are immediate.
    const detach = attachLiveAnalysis(ctx.store, { deferFull: (run) => setTimeout(run, 40) });
    props.onStore?.(ctx.store);
    // Fit once the view has its size.
    const t = setTimeout(() => fitToScene(ctx.editor), 30);
    const down = (e: KeyboardEvent) => {
      if (typing(e.target)) return;
      if (ctx.editor.keyDown({ key: e.key, shift: e.shiftKey, alt: e.altKey, mod: e.ctrlKey || e.metaKey })) e.preventDefault();
    };
    const up = (e: KeyboardEvent) => {
      if (!typing(e.target)) ctx.editor.keyUp({ key: e.key, shift: e.shiftKey, alt: e.altKey, mod: e.ctrlKey || e.metaKey });
    };
    window.addEventListener('keydown', down);
    window.addEventListener('keyup', up);
    return () => {
      clearTimeout(t);
      detach();
      window.removeEventListener('keydown', down);
      window.removeEventListener('keyup', up);
    };
  }, [ctx]); // eslint-disable-line react-hooks/exhaustive-deps

  return (
    <EditorContext.Provider value={value}>
      <div className="flex h-full flex-col">
        <TopBar scene={props.scene} user={props.user} />
        <div className="relative flex min-h-0 flex-1" data-drawer-host>
          <ToolRail />
          <div className="relative flex min-w-0 flex-1 flex-col">
            <div className="relative min-h-0 flex-1">
              <PlanView />
              <UsableAreaLayer />
              <ScaleBar />
              <ReachEnvelopeToggle />
              {props.review && <EditorReview sceneId={props.scene.id} review={props.review} />}
            </div>
            <SlewScrubber />
          </div>
          <SidePanel />
        </div>
        <HelpSheet />
      </div>
    </EditorContext.Provider>
  );
}
