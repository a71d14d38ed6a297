import type { TrailerObject } from '../objects';
import { placePolygon, rectPolygon, type Polygon } from './vec';

export const trailerFootprints = (t: TrailerObject): Polygon[] => [placePolygon(rectPolygon(t.length, t.width), t)];
