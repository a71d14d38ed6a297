'use client';
import Link from 'next/link';
import { useEditorContext, useEditorState } from '../editor-context';
import { fitToScene, zoomBy } from '../editor/actions';
import { zoomPercent } from '../editor/camera';
import { ToolButton } from './button';
import { SceneSaveBar } from '../persistence/scene-save-bar';
import { parseSceneDocument } from '@/lib/scene/parse';
import { PlanExportMenu } from '../export/plan-export-menu';
import { ViewMenu } from './view-menu';

/** Scene title and status, undo/redo, snapping and zoom. */
export function TopBar({ scene, user }: { scene: { id: number; title: string; status: string; revision: number; updatedAt: string }; user: { name: string; role: string } }) {
  const { editor, store } = useEditorContext();
  const canUndo = useEditorState((s) => s.undoStack.length > 0);
  const canRedo = useEditorState((s) => s.redoStack.length > 0);
  const snap = useEditorState((s) => s.snapToGrid);
  const zoom = useEditorState((s) => zoomPercent(s.camera));
  const readOnly = useEditorState((s) => s.readOnly);
  return (
    <header className="flex min-h-14 shrink-0 flex-wrap items-center gap-x-1 gap-y-1 lg:flex-nowrap border-b border-paper-line bg-paper-raised px-2 py-1">
      <Link href="/scenes" className="flex min-h-11 items-center rounded-md px-2 text-sm font-medium text-teal hover:bg-paper-sunk">
        ← Scenes
      </Link>
      <div className="min-w-[6rem] flex-1 lg:min-w-[9rem]">
        <h1 className="truncate text-base font-semibold leading-tight" data-testid="scene-title">
          {scene.title}
        </h1>
        <p className="truncate text-xs text-ink-muted">
          {scene.status} · {user.name} ({user.role})
          {readOnly && <span className="ml-2 rounded bg-signal-light px-1.5 py-0.5 font-semibold text-ink">Read-only: you can look and scrub the slew, not edit</span>}
        </p>
      </div>
      <SceneSaveBar
        store={store}
        sceneId={scene.id}
        title={scene.title}
        server={{ revision: scene.revision, updatedAt: scene.updatedAt }}
        canEdit={!readOnly}
        canImport={!readOnly}
        parseDocument={parseSceneDocument}
        compact
      />
      <PlanExportMenu sceneId={scene.id} title={scene.title} />
      {!readOnly && (
        <>
          <ToolButton title="Undo (Ctrl Z)" aria-label="Undo" disabled={!canUndo} onClick={() => store.getState().undo()}>
            ↶
          </ToolButton>
          <ToolButton title="Redo (Ctrl Shift Z)" aria-label="Redo" disabled={!canRedo} onClick={() => store.getState().redo()}>
            ↷
          </ToolButton>
          <ToolButton title="Snap to grid (G)" active={snap} onClick={() => store.getState().set({ snapToGrid: !snap })} className="hidden lg:flex">
            Snap
          </ToolButton>
        </>
      )}
      {/* Laptop: the view controls in the bar. Tablet: one "View" menu, so the bar stays one row at 820 px. */}
      <div className="hidden items-center gap-x-1 lg:flex">
        <ToolButton title="Zoom out (−)" aria-label="Zoom out" onClick={() => zoomBy(editor, 0.8)}>
          −
        </ToolButton>
        <span className="w-14 text-center text-sm tabular-nums" data-testid="zoom" aria-label="Zoom">
          {zoom}%
        </span>
        <ToolButton title="Zoom in (+)" aria-label="Zoom in" onClick={() => zoomBy(editor, 1.25)}>
          +
        </ToolButton>
        <ToolButton title="Fit the scene (F)" onClick={() => fitToScene(editor)}>
          Fit
        </ToolButton>
        <ToolButton title="Keyboard shortcuts (?)" aria-label="Keyboard shortcuts" onClick={() => store.getState().set({ helpOpen: true })}>
          ?
        </ToolButton>
      </div>
      <ViewMenu
        className="lg:hidden"
        zoom={zoom}
        snap={readOnly ? null : snap}
        onSnap={() => store.getState().set({ snapToGrid: !snap })}
        onZoom={(f) => zoomBy(editor, f)}
        onFit={() => fitToScene(editor)}
        onHelp={() => store.getState().set({ helpOpen: true })}
      />
    </header>
  );
}
