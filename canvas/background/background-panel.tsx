'use client';

import { useRef, useState } from 'react';
import type { UnitSystem } from '@/lib/units';
import { placeNewBackground, type BackgroundPlacement } from './calibration';
import { CalibrationDialog } from './calibration-dialog';
import { backgroundUrl, imageSize, uploadBackground } from './upload-background';

interface Props {
  sceneId: number;
  background: BackgroundPlacement | null;
  units: UnitSystem;
  /** Owner operators edit; everyone else sees the settings only. */
  canEdit: boolean;
  /** Where a new image is centred (usually the middle of the view), site metres. */
  placeAt(): { x: number; y: number };
  /** One undoable change to document.background. */
  onChange(next: BackgroundPlacement | null): void;
}

const btn = 'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg border px-3 text-sm font-semibold disabled:opacity-50';

/** Inspector section for the site image under the sketch: upload, scale, opacity, lock. */
export function BackgroundPanel({ sceneId, background, units, canEdit, placeAt, onChange }: Props) {
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [calibrating, setCalibrating] = useState(false);

  const upload = async (file: File) => {
    setBusy(true);
    setError(null);
    try {
      const up = await uploadBackground(sceneId, file);
      const size = up.width && up.height ? { width: up.width, height: up.height } : await imageSize(up.url);
      onChange(placeNewBackground(String(up.id), size, placeAt()));
      setCalibrating(true);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
    }
  };

  /** Moves the image so its centre sits in the middle of the view, keeping its scale. */
  const centreInView = async () => {
    if (!background) return;
    try {
      const size = await imageSize(backgroundUrl(sceneId, background.uploadId));
      const c = placeAt();
      onChange({ ...background, x: c.x - (size.width / 2) * background.metresPerPixel, y: c.y + (size.height / 2) * background.metresPerPixel });
    } catch (e) {
      setError((e as Error).message);
    }
  };

  const disabled = !canEdit || busy;
  return (
    // The inspector gives this section its "Site image" heading.
    <section aria-label="Site image" className="space-y-3" data-testid="background-panel">
      {background && (
        <p className="text-sm font-semibold text-ink-soft" data-testid="background-state">
          {background.calibration ? '✓ Scale set' : '! Scale not set yet: use “Set scale…”'}
          {background.locked ? ' · locked' : ''}
        </p>
      )}
      {!background && <p className="text-sm text-ink-soft">A photo or aerial image under the sketch (PNG, JPEG or WebP, up to 10 MB).</p>}
      <div className="flex flex-wrap gap-2">
        <button type="button" className={`${btn} border-teal bg-teal text-white hover:bg-teal-dark`} disabled={disabled || !!background?.locked} onClick={() => input.current?.click()}>
          {busy ? 'Uploading…' : background ? 'Replace image' : 'Add site image'}
        </button>
        <input
          ref={input}
          type="file"
          accept="image/png,image/jpeg,image/webp"
          className="sr-only"
          aria-label="Site image file"
          data-testid="background-file-input"
          onChange={(e) => {
            const f = e.target.files?.[0];
            if (f) void upload(f);
          }}
        />
        {background && (
          <button type="button" className={`${btn} border-ink bg-paper-raised text-ink hover:bg-paper-sunk`} disabled={!canEdit || background.locked} onClick={() => setCalibrating(true)}>
            Set scale…
          </button>
        )}
        {background && (
          <button type="button" className={`${btn} border-paper-line bg-paper-raised text-ink hover:bg-paper-sunk`} disabled={!canEdit || background.locked} onClick={() => void centreInView()}>
            Centre in view
          </button>
        )}
      </div>
      {background && (
        <>
          <label className="block text-sm font-semibold text-ink">
            Opacity <span className="font-normal text-ink-soft">{Math.round(background.opacity * 100)} %</span>
            <input
              type="range"
              min={10}
              max={100}
              step={5}
              value={Math.round(background.opacity * 100)}
              disabled={!canEdit}
              onChange={(e) => onChange({ ...background, opacity: Number(e.target.value) / 100 })}
              className="mt-1 block h-11 w-full accent-teal"
            />
          </label>
          <div className="flex flex-wrap gap-2">
            <button
              type="button"
              aria-pressed={background.locked}
              className={`${btn} ${background.locked ? 'border-ink bg-ink text-paper' : 'border-paper-line bg-paper-raised text-ink hover:bg-paper-sunk'}`}
              disabled={!canEdit}
              onClick={() => onChange({ ...background, locked: !background.locked })}
            >
              <svg viewBox="0 0 20 20" width="18" height="18" aria-hidden="true" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round">
                <rect x="4" y="9" width="12" height="8" rx="1.5" />
                <path d={background.locked ? 'M7 9V6.5a3 3 0 0 1 6 0V9' : 'M7 9V6.5a3 3 0 0 1 5.8-1'} />
              </svg>
              {background.locked ? 'Locked' : 'Lock image'}
            </button>
            <button type="button" className={`${btn} border-paper-line bg-paper-raised text-over hover:bg-over-light`} disabled={!canEdit || background.locked} onClick={() => onChange(null)}>
              Remove
            </button>
          </div>
        </>
      )}
      {error && (
        <p role="alert" className="rounded-md border border-over/40 bg-over-light px-3 py-2 text-sm text-over">
          {error}
        </p>
      )}
      {calibrating && background && (
        <CalibrationDialog
          imageUrl={backgroundUrl(sceneId, background.uploadId)}
          background={background}
          units={units}
          onCancel={() => setCalibrating(false)}
          onApply={(next) => {
            onChange(next);
            setCalibrating(false);
          }}
        />
      )}
    </section>
  );
}
