/// <reference lib="webworker" />
import { prepareLift, type LiftInputIn } from '@/lib/lift';
import { envelopeGrid, envelopeShapes } from '@/lib/envelope';

/** Computes the reach envelope off the main thread: the editor posts the engine input, this answers the grid and its shapes. */
self.onmessage = (e: MessageEvent<{ id: number; input: LiftInputIn }>) => {
  const t0 = performance.now();
  try {
    const grid = envelopeGrid(prepareLift(e.data.input));
    const shapes = grid ? envelopeShapes(grid) : null;
    self.postMessage({ id: e.data.id, grid, shapes, ms: performance.now() - t0 });
  } catch {
    self.postMessage({ id: e.data.id, grid: null, shapes: null, ms: performance.now() - t0 });
  }
};
