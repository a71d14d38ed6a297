import type { LiftInputIn } from '@/lib/lift';
import type { EnvelopeGrid, EnvelopeShapes } from '@/lib/envelope';
import type { EnvelopePicture, PictureRequest } from './envelope-picture';

/** What the editor asks the envelope worker: a new grid (the scene changed) or a new bitmap of the last one (zoom, pan). */
export type EnvelopeJob =
  | { id: number; kind: 'grid'; input: LiftInputIn; picture: PictureRequest | null }
  | { id: number; kind: 'picture'; picture: PictureRequest };

export interface EnvelopeAnswer {
  id: number;
  kind: EnvelopeJob['kind'];
  /** The grid (kind 'grid'; null when there is no envelope). */
  grid: EnvelopeGrid | null;
  cutBy: string[];
  /** Only when the worker cannot paint (no OffscreenCanvas): the editor paints from these. */
  shapes: EnvelopeShapes | null;
  /** The envelope painted for the view asked for; its image an ImageBitmap, transferred. */
  picture: EnvelopePicture | null;
  /** Time the grid and its shapes took, ms (kind 'grid'), or the repaint (kind 'picture'). */
  ms: number;
}

/** The grid's typed arrays' buffers, to transfer rather than copy. */
export function gridBuffers(g: EnvelopeGrid): ArrayBuffer[] {
  return [g.radii, g.reach, g.offset, g.ccw, g.cw, g.chart, g.cut].map((a) => a.buffer as ArrayBuffer);
}
