'use client';
import { useEffect } from 'react';
import { prepareLift, type LiftInputIn } from '@/lib/lift';
import { envelopeGrid, envelopeShapes, type EnvelopeGrid, type EnvelopeShapes } from '@/lib/envelope';
import { useEditorState } from '../editor-context';
import { envelopeStore, useEnvelopeState } from './reach-envelope-store';

/**
 * Keeps the reach envelope in step with the scene while it is shown. The grid takes tens of milliseconds
 * (npm run bench:editor prints it), more than a 60 fps frame holds, so it runs in a Web Worker: one request
 * in flight, and only the newest input waits behind it, so a drag never queues up stale work.
 */
type Answer = { id: number; grid: EnvelopeGrid | null; shapes: EnvelopeShapes | null; ms: number };

let worker: Worker | null = null;
let nextId = 0;
let inFlight: number | null = null;
let pending: LiftInputIn | null = null;

function deliver(a: Answer, where: 'worker' | 'main') {
  envelopeStore.set({ grid: a.grid, shapes: a.shapes, ms: a.ms, where, busy: pending !== null });
}

function send(input: LiftInputIn) {
  if (typeof Worker === 'undefined') {
    const t0 = performance.now();
    const grid = envelopeGrid(prepareLift(input));
    deliver({ id: 0, grid, shapes: grid ? envelopeShapes(grid) : null, ms: performance.now() - t0 }, 'main');
    return;
  }
  if (!worker) {
    worker = new Worker(new URL('./reach-envelope.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (e: MessageEvent<Answer>) => {
      if (e.data.id !== inFlight) return;
      inFlight = null;
      const next = pending;
      pending = null;
      if (next) send(next);
      deliver(e.data, 'worker');
    };
  }
  inFlight = ++nextId;
  envelopeStore.set({ busy: true });
  worker.postMessage({ id: inFlight, input });
}

export function requestEnvelope(input: LiftInputIn) {
  if (inFlight !== null) pending = input;
  else send(input);
}

export function useReachEnvelope() {
  const lift = useEditorState((s) => s.analysis?.lift ?? null);
  const on = useEnvelopeState((s) => s.on);
  useEffect(() => {
    if (!on) return;
    if (!lift?.ok) {
      envelopeStore.set({ grid: null, shapes: null });
      return;
    }
    requestEnvelope(lift.input);
  }, [on, lift]);
}
