/// <reference lib="webworker" />
import { prepareLift } from '@/lib/lift';
import { envelopeGrid, envelopeShapes, type EnvelopeShapes } from '@/lib/envelope';
import { NOTHING, paintPicture, shapesBounds, type EnvelopePicture, type PictureRequest } from './envelope-picture';
import { gridBuffers, type EnvelopeAnswer, type EnvelopeJob } from './envelope-messages';

/**
 * Computes the reach envelope off the main thread: the editor posts the engine input, this answers the
 * grid and the envelope painted into a bitmap for the part of the plan in view. Both travel as transferred
 * buffers, not copies. The last shapes stay here, so a zoom or pan past the bitmap only repaints.
 */
let shapes: EnvelopeShapes | null = null;

const canPaint = typeof OffscreenCanvas !== 'undefined';

function picture(req: PictureRequest | null): EnvelopePicture | null {
  if (!shapes || !req || !canPaint) return null;
  const bounds = shapesBounds(shapes, 4 / req.pxPerM) ?? NOTHING;
  const p = paintPicture(shapes, bounds, req, (w, h) => new OffscreenCanvas(w, h));
  if (!p) return { image: null, box: null, scale: req.scale, covers: req.view, bounds, asked: req.scale };
  return { image: p.canvas.transferToImageBitmap(), box: p.box, scale: p.scale, covers: p.covers, bounds, asked: req.scale };
}

function answer(a: EnvelopeAnswer) {
  const transfer: Transferable[] = [];
  if (a.grid) transfer.push(...gridBuffers(a.grid));
  if (a.picture?.image) transfer.push(a.picture.image as ImageBitmap);
  self.postMessage(a, transfer);
}

self.onmessage = (e: MessageEvent<EnvelopeJob>) => {
  const job = e.data;
  const t0 = performance.now();
  if (job.kind === 'picture') {
    answer({ id: job.id, kind: 'picture', grid: null, cutBy: [], shapes: null, picture: picture(job.picture), ms: performance.now() - t0 });
    return;
  }
  try {
    const grid = envelopeGrid(prepareLift(job.input));
    shapes = grid ? envelopeShapes(grid) : null;
    const ms = performance.now() - t0;
    const pic = picture(job.picture);
    // Without OffscreenCanvas the editor paints the bitmap itself, once per answer, from the shapes.
    answer({ id: job.id, kind: 'grid', grid, cutBy: shapes?.cutBy ?? [], shapes: canPaint ? null : shapes, picture: pic, ms });
  } catch {
    shapes = null;
    answer({ id: job.id, kind: 'grid', grid: null, cutBy: [], shapes: null, picture: null, ms: performance.now() - t0 });
  }
};
