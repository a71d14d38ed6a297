import type { TrailerObject } from '../../document/objects';
import { placePolygon, rectPolygon, type Polygon } from '../../geometry/vec';

export const trailerFootprints = (t: TrailerObject): Polygon[] => [placePolygon(rectPolygon(t.length, t.width), t)];
