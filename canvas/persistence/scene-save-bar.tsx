'use client';

import { ConflictDialog } from './conflict-dialog';
import { SaveIndicator } from './save-indicator';
import { SceneFileActions } from './scene-file-actions';
import type { DocumentParser } from './scene-file';
import type { EditorStoreLike } from './store-adapter';
import { useAutosave } from './use-autosave';

interface Props<Doc> {
  store: EditorStoreLike<Doc>;
  sceneId: number;
  title: string;
  server: { revision: number; updatedAt?: string };
  /** The owner operator edits (and so autosaves); other readers only export. */
  canEdit: boolean;
  canImport: boolean;
  parseDocument: DocumentParser<Doc>;
  /** Narrow toolbars show the indicator's short form. */
  compact?: boolean;
}

/**
 * Everything about keeping the scene: autosave with its indicator, the conflict choice, and
 * export/import. The editor toolbar renders this once.
 */
export function SceneSaveBar<Doc>({ store, sceneId, title, server, canEdit, canImport, parseDocument, compact }: Props<Doc>) {
  const { state, saver } = useAutosave(store, { sceneId, title, server, enabled: canEdit });
  return (
    <div className="flex shrink-0 flex-nowrap items-center gap-2">
      {canEdit && <SaveIndicator state={state} compact={compact} />}
      <SceneFileActions title={title} getDocument={() => store.getState().document} parseDocument={parseDocument} canImport={canImport} compact={compact} />
      {state.status === 'conflict' && saver && (
        <ConflictDialog
          title={title}
          yourRevision={state.revision}
          serverRevision={state.serverRevision}
          onReloadTheirs={() => saver.reloadTheirs()}
          onKeepMine={async () => {
            const { id } = await saver.keepMineAsCopy();
            saver.stop();
            // eslint-disable-next-line @next/next/no-location-assign-relative-destination -- a full load on purpose: the editor builds its store once per page
            window.location.assign(`/scenes/${id}`);
          }}
        />
      )}
    </div>
  );
}
