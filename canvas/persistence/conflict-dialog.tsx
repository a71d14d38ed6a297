'use client';

import { useEffect, useRef, useState } from 'react';
import { copyTitle } from './scene-api';
import { BodyPortal } from './portal';

interface Props {
  title: string;
  yourRevision: number;
  serverRevision?: number;
  onReloadTheirs(): Promise<void>;
  onKeepMine(): Promise<void>;
}

/** Shown when a save was refused because someone else saved first. Both ways out are explicit; there is no "close". */
export function ConflictDialog({ title, yourRevision, serverRevision, onReloadTheirs, onKeepMine }: Props) {
  const [busy, setBusy] = useState<null | 'reload' | 'copy'>(null);
  const [error, setError] = useState<string | null>(null);
  const first = useRef<HTMLButtonElement>(null);
  useEffect(() => first.current?.focus(), []);

  const run = (which: 'reload' | 'copy', fn: () => Promise<void>) => async () => {
    setBusy(which);
    setError(null);
    try {
      await fn();
    } catch (e) {
      setError((e as Error).message || 'That did not work; check the connection and try again.');
      setBusy(null);
    }
  };

  return (
    <BodyPortal>
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/50 p-4">
      <div role="alertdialog" aria-modal="true" aria-labelledby="conflict-title" aria-describedby="conflict-body" className="w-full max-w-lg rounded-xl border border-paper-line bg-paper-raised p-6 shadow-2xl">
        <div className="flex items-start gap-3">
          <svg viewBox="0 0 20 20" width="28" height="28" aria-hidden="true" className="mt-0.5 shrink-0 text-over">
            <g fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" strokeLinecap="round">
              <path d="M10 2.8L18 17H2z" />
              <path d="M10 8v4M10 14.6v.2" />
            </g>
          </svg>
          <div>
            <h2 id="conflict-title" className="text-xl font-bold text-ink">
              Someone else saved this scene
            </h2>
            <p id="conflict-body" className="mt-2 text-base text-ink-soft">
              Your changes to <strong className="text-ink">{title}</strong> are based on revision {yourRevision}
              {serverRevision ? `, but the scene is now at revision ${serverRevision}` : ', but a newer revision exists'}. Your version is kept on
              this device until you choose.
            </p>
          </div>
        </div>
        <div className="mt-6 grid gap-3 sm:grid-cols-2">
          <button
            ref={first}
            type="button"
            disabled={busy !== null}
            onClick={run('reload', onReloadTheirs)}
            className="min-h-12 rounded-lg border-2 border-teal bg-teal px-4 py-2 text-left font-semibold text-white hover:bg-teal-dark disabled:opacity-60"
          >
            {busy === 'reload' ? 'Loading their version…' : 'Reload their version'}
            <span className="block text-sm font-normal text-teal-light">Your unsaved changes are discarded.</span>
          </button>
          <button
            type="button"
            disabled={busy !== null}
            onClick={run('copy', onKeepMine)}
            className="min-h-12 rounded-lg border-2 border-ink bg-paper-raised px-4 py-2 text-left font-semibold text-ink hover:bg-paper-sunk disabled:opacity-60"
          >
            {busy === 'copy' ? 'Saving your copy…' : 'Keep mine as a copy'}
            <span className="block text-sm font-normal text-ink-soft">Saved as a new scene, “{copyTitle(title)}”.</span>
          </button>
        </div>
        {error && (
          <p role="alert" className="mt-4 rounded-md border border-over/40 bg-over-light px-3 py-2 text-sm text-over">
            Could not finish: {error}
          </p>
        )}
      </div>
    </div>
    </BodyPortal>
  );
}
