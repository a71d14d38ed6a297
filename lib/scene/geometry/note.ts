import type { NoteObject } from '../objects';
import { placePolygon, type Polygon } from './vec';

/** A note's box in metres at the given screen scale (text is drawn at a fixed pixel size). */
export function noteFootprints(n: NoteObject, pxPerM: number): Polygon[] {
  const lines = n.text.split('\n');
  const w = (Math.max(4, ...lines.map((l) => l.length)) * 8 + 16) / pxPerM;
  const h = (lines.length * 18 + 12) / pxPerM;
  return [placePolygon([{ x: 0, y: 0 }, { x: w, y: 0 }, { x: w, y: -h }, { x: 0, y: -h }], n)];
}
