'use client';

import { useRef, useState } from 'react';
import { buildSceneFile, parseSceneFile, sceneFileName, serializeSceneFile, type DocumentParser, type FieldIssue } from './scene-file';
import { createScene } from './scene-api';
import { BodyPortal } from './portal';

interface Props<Doc> {
  title: string;
  getDocument(): Doc;
  parseDocument: DocumentParser<Doc>;
  /** Only operators create scenes, so only they see "Import". */
  canImport: boolean;
  /** Narrow toolbars: icons with accessible names, words from xl screens up. */
  compact?: boolean;
  /** Where to go after an import; defaults to a full page load of the new scene. */
  onImported?(id: number): void;
}

const buttonClass =
  'inline-flex min-h-11 items-center gap-1.5 rounded-lg border border-paper-line bg-paper-raised px-2.5 text-sm font-semibold text-ink hover:bg-paper-sunk disabled:opacity-60';

/** Export the open scene as an Arcline scene file, or import one as a new scene. */
export function SceneFileActions<Doc>({ title, getDocument, parseDocument, canImport, compact, onImported }: Props<Doc>) {
  // Words beside the icons from tablet width up; a phone's toolbar keeps the icons (with their labels for assistive tech).
  const word = compact ? 'hidden sm:inline' : '';
  const input = useRef<HTMLInputElement>(null);
  const [issues, setIssues] = useState<FieldIssue[] | null>(null);
  const [fileName, setFileName] = useState('');
  const [busy, setBusy] = useState(false);

  const exportFile = () => {
    const text = serializeSceneFile(buildSceneFile(title, getDocument()));
    const url = URL.createObjectURL(new Blob([text], { type: 'application/json' }));
    const a = document.createElement('a');
    a.href = url;
    a.download = sceneFileName(title);
    document.body.appendChild(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(url), 1000);
  };

  const importFile = async (file: File) => {
    setFileName(file.name);
    setBusy(true);
    try {
      const parsed = parseSceneFile(await file.text(), parseDocument);
      if (!parsed.ok) return setIssues(parsed.issues);
      const scene = await createScene(fetch, parsed.title, parsed.document);
      if (onImported) onImported(scene.id);
      // eslint-disable-next-line @next/next/no-location-assign-relative-destination -- a full load on purpose: the editor builds its store once per page
      else window.location.assign(`/scenes/${scene.id}`);
    } catch (e) {
      setIssues([{ path: 'file', message: (e as Error).message }]);
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
    }
  };

  return (
    <>
      <button type="button" className={buttonClass} onClick={exportFile} aria-label="Export" title="Download this scene as an Arcline scene file (.arcline.json)">
        <svg viewBox="0 0 20 20" width="18" height="18" aria-hidden="true" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round">
          <path d="M10 3v10M6 9l4 4 4-4M4 16h12" />
        </svg>
        <span className={word}>Export</span>
      </button>
      {canImport && (
        <>
          <button type="button" className={buttonClass} disabled={busy} onClick={() => input.current?.click()} aria-label="Import" title="Open an Arcline scene file as a new scene">
            <svg viewBox="0 0 20 20" width="18" height="18" aria-hidden="true" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round">
              <path d="M10 13V3M6 7l4-4 4 4M4 16h12" />
            </svg>
            <span className={word}>{busy ? 'Importing…' : 'Import'}</span>
          </button>
          <input
            ref={input}
            type="file"
            accept=".json,application/json"
            className="sr-only"
            aria-label="Scene file to import"
            data-testid="scene-import-input"
            onChange={(e) => {
              const f = e.target.files?.[0];
              if (f) void importFile(f);
            }}
          />
        </>
      )}
      {issues && (
        <BodyPortal>
        <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/50 p-4">
          <div role="alertdialog" aria-modal="true" aria-labelledby="import-title" className="w-full max-w-lg rounded-xl border border-paper-line bg-paper-raised p-6 shadow-2xl">
            <h2 id="import-title" className="text-xl font-bold text-ink">
              Could not import {fileName || 'the file'}
            </h2>
            <p className="mt-2 text-ink-soft">Nothing was created. The file has these problems:</p>
            <ul className="mt-3 max-h-64 space-y-1 overflow-auto text-sm">
              {issues.map((i, n) => (
                <li key={n} className="rounded border border-over/30 bg-over-light px-3 py-1.5 text-ink">
                  <code className="font-semibold text-over">{i.path}</code>: {i.message}
                </li>
              ))}
            </ul>
            <div className="mt-5 flex justify-end">
              <button type="button" className={buttonClass} onClick={() => setIssues(null)} autoFocus>
                Close
              </button>
            </div>
          </div>
        </div>
        </BodyPortal>
      )}
    </>
  );
}
