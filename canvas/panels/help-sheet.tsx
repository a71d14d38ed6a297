'use client';
import { useEditorContext, useEditorState } from '../editor-context';
import { SHORTCUTS } from '../editor/shortcuts';

/** Every keyboard shortcut and touch gesture, from the same table the editor uses. */
export function HelpSheet() {
  const { store } = useEditorContext();
  const open = useEditorState((s) => s.helpOpen);
  if (!open) return null;
  const groups = ['Tools', 'Edit', 'Swing', 'View'] as const;
  return (
    <div role="dialog" aria-modal="true" aria-labelledby="help-title" className="fixed inset-0 z-50 flex items-center justify-center bg-ink/40 p-4" onClick={() => store.getState().set({ helpOpen: false })}>
      <div className="max-h-full w-full max-w-3xl overflow-y-auto rounded-lg bg-paper-raised p-5 shadow-xl" onClick={(e) => e.stopPropagation()}>
        <div className="flex items-center justify-between">
          <h2 id="help-title" className="text-lg font-semibold">
            Keys and gestures
          </h2>
          <button type="button" className="min-h-11 rounded-md px-3 text-sm font-medium text-teal hover:bg-paper-sunk" onClick={() => store.getState().set({ helpOpen: false })}>
            Close
          </button>
        </div>
        <div className="mt-3 grid gap-5 sm:grid-cols-2">
          {groups.map((g) => (
            <section key={g}>
              <h3 className="mb-1 text-sm font-semibold uppercase tracking-wide text-ink-muted">{g}</h3>
              <dl className="text-sm">
                {SHORTCUTS.filter((s) => s.group === g).map((s) => (
                  <div key={s.keys} className="flex justify-between gap-3 border-b border-paper-line py-1.5">
                    <dt>
                      <kbd className="rounded border border-paper-line bg-paper px-1.5 py-0.5 font-mono text-xs">{s.keys}</kbd>
                    </dt>
                    <dd className="text-right">{s.does}</dd>
                  </div>
                ))}
              </dl>
            </section>
          ))}
          <section>
            <h3 className="mb-1 text-sm font-semibold uppercase tracking-wide text-ink-muted">Touch</h3>
            <ul className="space-y-1 text-sm">
              <li>One finger on an object: select and drag it.</li>
              <li>One finger on empty ground: pan.</li>
              <li>Two fingers: pinch to zoom, move to pan.</li>
              <li>Drag the amber boom tip round to slew; drag a pad along its leg.</li>
              <li>Drag the round handle ahead of a selected object to turn it.</li>
            </ul>
          </section>
        </div>
      </div>
    </div>
  );
}
