'use client';

import { useEffect, useRef, useState } from 'react';
import { mToIn, type UnitSystem } from '@/lib/units';
import { formatNumber } from '@/lib/format/number';
import { formatLength } from '@/lib/format/quantity';
import { BodyPortal } from '../persistence/portal';
import { applyCalibration, CalibrationError, parseDistance, type BackgroundPlacement, type ImagePoint } from './calibration';

/** A pixel's size in units people can picture: centimetres or inches. */
const pixelScale = (mpp: number, units: UnitSystem) => (units === 'metric' ? `${formatNumber(mpp * 100, 2)} cm` : `${formatNumber(mToIn(mpp), 2)} in`);

interface Props {
  imageUrl: string;
  background: BackgroundPlacement;
  units: UnitSystem;
  onApply(next: BackgroundPlacement): void;
  onCancel(): void;
}

/**
 * Scale calibration: tap two points on the image whose real distance is known (a lane width, a trailer
 * length, a tape laid on the ground), type that distance, apply.
 */
export function CalibrationDialog({ imageUrl, background, units, onApply, onCancel }: Props) {
  const img = useRef<HTMLImageElement>(null);
  const [size, setSize] = useState<{ width: number; height: number } | null>(null);
  const [points, setPoints] = useState<ImagePoint[]>(background.calibration ? [background.calibration.a, background.calibration.b] : []);
  const [distanceText, setDistanceText] = useState(background.calibration ? formatLength(background.calibration.distance, units) : '');
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && onCancel();
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onCancel]);

  const pick = (e: React.PointerEvent<HTMLDivElement>) => {
    const el = img.current;
    if (!el || !size) return;
    const r = el.getBoundingClientRect();
    const p = { x: ((e.clientX - r.left) / r.width) * size.width, y: ((e.clientY - r.top) / r.height) * size.height };
    if (p.x < 0 || p.y < 0 || p.x > size.width || p.y > size.height) return;
    setPoints((prev) => (prev.length >= 2 ? [p] : [...prev, p]));
    setError(null);
  };

  const distance = parseDistance(distanceText, units);
  const pixelGap = points.length === 2 ? Math.hypot(points[1].x - points[0].x, points[1].y - points[0].y) : null;

  const apply = () => {
    if (!size) return;
    if (points.length < 2) return setError('points: tap two points on the image first');
    if (distance === null) return setError(`distance: type the known distance in ${units === 'metric' ? 'metres, e.g. 12.5' : `feet and inches, e.g. 40' 6"`}`);
    try {
      onApply(applyCalibration(background, size, points[0], points[1], distance));
    } catch (e) {
      setError(e instanceof CalibrationError ? `${e.field}: ${e.message}` : String(e));
    }
  };

  const r = size ? Math.max(size.width, size.height) / 120 : 4;
  return (
    <BodyPortal>
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/60 p-3">
      <div role="dialog" aria-modal="true" aria-labelledby="calibrate-title" className="flex max-h-full w-full max-w-4xl flex-col rounded-xl border border-paper-line bg-paper-raised shadow-2xl">
        <div className="border-b border-paper-line px-5 py-3">
          <h2 id="calibrate-title" className="text-lg font-bold text-ink">
            Set the image scale
          </h2>
          <p className="text-sm text-ink-soft">
            {points.length === 0 && 'Tap the first of two points whose real distance you know.'}
            {points.length === 1 && 'Now tap the second point.'}
            {points.length === 2 && 'Type the real distance between the two points. Tap again to start over.'}
          </p>
        </div>
        <div className="min-h-0 flex-1 overflow-auto bg-paper-sunk p-3">
          <div className="relative mx-auto w-fit touch-none select-none" onPointerDown={pick} data-testid="calibration-image">
            {/* eslint-disable-next-line @next/next/no-img-element -- a private, authenticated image; next/image would proxy it */}
            <img
              ref={img}
              src={imageUrl}
              alt="Site background to calibrate"
              draggable={false}
              onLoad={(e) => setSize({ width: e.currentTarget.naturalWidth, height: e.currentTarget.naturalHeight })}
              className="block max-h-[55vh] max-w-full"
            />
            {size && (
              <svg viewBox={`0 0 ${size.width} ${size.height}`} className="pointer-events-none absolute inset-0 h-full w-full" aria-hidden="true">
                {points.length === 2 && (
                  <line x1={points[0].x} y1={points[0].y} x2={points[1].x} y2={points[1].y} stroke="#F2A900" strokeWidth={r / 1.5} strokeDasharray={`${r * 2} ${r}`} />
                )}
                {points.map((p, i) => (
                  <g key={i}>
                    <circle cx={p.x} cy={p.y} r={r * 1.6} fill="none" stroke="#15202B" strokeWidth={r / 1.5} />
                    <circle cx={p.x} cy={p.y} r={r * 1.6} fill="none" stroke="#F2A900" strokeWidth={r / 3} />
                    <text x={p.x + r * 2.2} y={p.y - r * 2.2} fontSize={r * 4} fontWeight={700} fill="#15202B" stroke="#FFFFFF" strokeWidth={r / 2} paintOrder="stroke">
                      {i === 0 ? 'A' : 'B'}
                    </text>
                  </g>
                ))}
              </svg>
            )}
          </div>
        </div>
        <div className="flex flex-wrap items-end gap-3 border-t border-paper-line px-5 py-3">
          <label className="flex min-w-48 flex-1 flex-col text-sm font-semibold text-ink">
            Known distance A–B ({units === 'metric' ? 'metres' : 'feet and inches'})
            <input
              value={distanceText}
              onChange={(e) => setDistanceText(e.target.value)}
              inputMode="decimal"
              placeholder={units === 'metric' ? '12.5' : `40' 6"`}
              aria-invalid={distanceText !== '' && distance === null}
              className="mt-1 min-h-11 rounded-lg border border-paper-line bg-paper px-3 text-base font-normal"
            />
          </label>
          <p className="min-h-11 flex-1 text-sm text-ink-soft" aria-live="polite">
            {pixelGap !== null && `A–B is ${Math.round(pixelGap)} image pixels`}
            {pixelGap !== null && distance !== null && `, so 1 pixel = ${pixelScale(distance / pixelGap, units)}`}
          </p>
          <div className="flex gap-2">
            <button type="button" onClick={onCancel} className="min-h-11 rounded-lg border border-paper-line px-4 font-semibold text-ink hover:bg-paper-sunk">
              Cancel
            </button>
            <button type="button" onClick={apply} className="min-h-11 rounded-lg bg-teal px-4 font-semibold text-white hover:bg-teal-dark">
              Apply scale
            </button>
          </div>
          {error && (
            <p role="alert" className="w-full rounded-md border border-over/40 bg-over-light px-3 py-2 text-sm text-over">
              {error}
            </p>
          )}
        </div>
      </div>
    </div>
    </BodyPortal>
  );
}
