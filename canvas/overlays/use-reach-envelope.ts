'use client';
import { useEffect } from 'react';
import { prepareLift, type LiftInputIn } from '@/lib/lift';
import { envelopeGrid, envelopeShapes, type EnvelopeShapes } from '@/lib/envelope';
import type { TruckObject } from '@/lib/scene/objects';
import { useEditorContext } from '../editor-context';
import type { EditorState } from '../store/types';
import { envelopeStore, useEnvelopeState } from './reach-envelope-store';
import type { EnvelopeAnswer, EnvelopeJob } from './envelope-messages';
import { NOTHING, paintPicture, pictureServes, shapesBounds, viewInTruckFrame, type EnvelopePicture, type PictureRequest } from './envelope-picture';

/**
 * Keeps the reach envelope in step with the scene while it is shown. The grid takes tens of milliseconds
 * (npm run bench:editor prints it), more than a 60 fps frame holds, so it runs in a Web Worker: one request
 * in flight, and only the newest input waits behind it, so a drag never queues up stale work. The worker
 * also paints the envelope into a bitmap for the view (envelope-picture.ts): the overlay draws that bitmap
 * each frame instead of thousands of cells. A zoom or a pan that leaves the bitmap asks for a new one.
 */

/** Share of the view's size painted beyond each edge, so a drag or pan of that much needs no new bitmap. */
const MARGIN = 0.5;
/**
 * While a gesture is in progress the worker rests as long as its last job took before it starts the next,
 * so it takes at most half a core: on a two-core machine a worker that never rests slows the editor's own
 * frames (npm run bench:editor). A fast machine still gets an update every few frames.
 */
const REST_SHARE = 1;

let worker: Worker | null = null;
let nextId = 0;
let inFlight: number | null = null;
/** The picture asked for by the job in flight, so a view it will serve asks for nothing more. */
let inFlightPicture: PictureRequest | null = null;
let pendingInput: LiftInputIn | null = null;
let pendingPicture = false;
/** What the view needs painted now (kept current by the editor store's changes). */
let want: PictureRequest | null = null;
let wantView: PictureRequest['view'] | null = null;
/** Shapes kept on this side only when the worker cannot paint (or there is no worker). */
let mainShapes: EnvelopeShapes | null = null;
let gesture = false;
let sentAt = 0;
let restUntil = 0;
let restTimer: ReturnType<typeof setTimeout> | null = null;

function paintHere(req: PictureRequest | null): EnvelopePicture | null {
  if (!mainShapes || !req || typeof document === 'undefined') return null;
  const bounds = shapesBounds(mainShapes, 4 / req.pxPerM) ?? NOTHING;
  const p = paintPicture(mainShapes, bounds, req, (w, h) => Object.assign(document.createElement('canvas'), { width: w, height: h }));
  return p ? { image: p.canvas, box: p.box, scale: p.scale, covers: p.covers, bounds, asked: req.scale } : { image: null, box: null, scale: req.scale, covers: req.view, bounds, asked: req.scale };
}

function deliver(a: EnvelopeAnswer, where: 'worker' | 'main') {
  const busy = pendingInput !== null || inFlight !== null;
  if (a.kind === 'grid') {
    mainShapes = a.shapes;
    const picture = a.picture ?? (a.shapes ? paintHere(want) : null);
    envelopeStore.set({ grid: a.grid, cutBy: a.cutBy, picture, ms: a.ms, where, busy });
  } else if (a.picture) {
    envelopeStore.set({ picture: a.picture, busy });
  } else if (mainShapes) {
    envelopeStore.set({ picture: paintHere(want), busy });
  }
}

function post(job: EnvelopeJob) {
  if (typeof Worker === 'undefined') {
    const t0 = performance.now();
    if (job.kind === 'grid') {
      const grid = envelopeGrid(prepareLift(job.input));
      const shapes = grid ? envelopeShapes(grid) : null;
      deliver({ id: 0, kind: 'grid', grid, cutBy: shapes?.cutBy ?? [], shapes, picture: null, ms: performance.now() - t0 }, 'main');
    } else deliver({ id: 0, kind: 'picture', grid: null, cutBy: [], shapes: null, picture: null, ms: 0 }, 'main');
    return;
  }
  if (!worker) {
    worker = new Worker(new URL('./reach-envelope.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (e: MessageEvent<EnvelopeAnswer>) => {
      if (e.data.id !== inFlight) return;
      inFlight = null;
      inFlightPicture = null;
      const now = performance.now();
      restUntil = now + REST_SHARE * (now - sentAt);
      pump();
      deliver(e.data, 'worker');
    };
  }
  inFlight = ++nextId;
  inFlightPicture = job.picture;
  sentAt = performance.now();
  envelopeStore.set({ busy: true });
  worker.postMessage({ ...job, id: inFlight });
}

function pump() {
  if (inFlight !== null || restTimer !== null) return;
  const wait = gesture ? restUntil - performance.now() : 0;
  if (wait > 0 && (pendingInput || pendingPicture)) {
    restTimer = setTimeout(() => {
      restTimer = null;
      pump();
    }, wait);
    return;
  }
  if (pendingInput) {
    const input = pendingInput;
    pendingInput = null;
    pendingPicture = false;
    post({ id: 0, kind: 'grid', input, picture: want });
  } else if (pendingPicture && want) {
    pendingPicture = false;
    post({ id: 0, kind: 'picture', picture: want });
  }
}

export function requestEnvelope(input: LiftInputIn) {
  pendingInput = input;
  pump();
}

/** Whether the bitmap shown (or the one on its way) serves the view; if not, asks for one that does. */
function checkPicture(s: EditorState) {
  const wasGesture = gesture;
  gesture = s.gestureBase !== null;
  // The gesture is over: what waits goes now.
  if (wasGesture && !gesture && restTimer !== null) {
    clearTimeout(restTimer);
    restTimer = null;
    pump();
  }
  const truck = s.document.objects.find((o): o is TruckObject => o.kind === 'truck');
  if (!truck || !(s.viewport.width > 0)) return;
  const dpr = typeof window === 'undefined' ? 1 : window.devicePixelRatio || 1;
  const scale = s.camera.pxPerM * dpr;
  const view = viewInTruckFrame(s.camera, s.viewport, truck, 0);
  const { picture, grid } = envelopeStore.get();
  if (!want || !wantView || want.pxPerM !== s.camera.pxPerM || !inBox(view, wantView)) {
    want = { view: viewInTruckFrame(s.camera, s.viewport, truck, MARGIN), scale, pxPerM: s.camera.pxPerM };
    wantView = want.view;
  }
  if (!grid) return;
  if (picture && pictureServes(picture, view, scale)) return;
  if (inFlightPicture && (!picture || pictureServes({ covers: inFlightPicture.view, bounds: picture.bounds, asked: inFlightPicture.scale }, view, scale))) return;
  pendingPicture = true;
  pump();
}

const inBox = (a: PictureRequest['view'], b: PictureRequest['view']) => a.x0 >= b.x0 && a.y0 >= b.y0 && a.x1 <= b.x1 && a.y1 <= b.y1;

/**
 * Follows the editor store while the envelope is shown: a new engine input asks for a new grid, a view
 * the bitmap does not serve asks for a repaint. A store subscription rather than React state, so a drag
 * frame does not re-render the envelope's key.
 */
export function useReachEnvelope() {
  const { store } = useEditorContext();
  const on = useEnvelopeState((s) => s.on);
  useEffect(() => {
    if (!on) return;
    let last: LiftState | undefined;
    const sync = (s: EditorState) => {
      checkPicture(s);
      const lift = s.analysis?.lift ?? null;
      if (lift === last) return;
      last = lift;
      if (!lift?.ok) envelopeStore.set({ grid: null, cutBy: [], picture: null });
      else requestEnvelope(lift.input);
    };
    sync(store.getState());
    const off = store.subscribe(sync);
    const offEnvelope = envelopeStore.subscribe(() => checkPicture(store.getState()));
    return () => {
      off();
      offEnvelope();
    };
  }, [on, store]);
}

type LiftState = NonNullable<EditorState['analysis']>['lift'] | null;
