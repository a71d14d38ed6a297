import type { EnvelopeGrid } from './grid';

/**
 * The envelope as shapes to draw, truck frame (m): the region inside the limits in three margin bands,
 * the parts of it where the load meets a truck part or an obstacle, and its boundary split by the limit
 * that governs there. Each grid cell is clipped by the share of the governing limit (≤ 1 inside),
 * interpolated along the cell's edges, so the boundary runs between the nodes rather than along them.
 */
export type Band = 'ample' | 'fair' | 'near';
/** Share of the limit used: under 0.6 ample, to 0.9 fair, above 0.9 near (the checks' own "near" line, within 10 %). */
export const BAND_EDGES = { fair: 0.6, near: 0.9 } as const;

export interface EnvelopeShapes {
  /** Flat [x0, y0, x1, y1, …] polygons per band. */
  bands: Record<Band, number[][]>;
  /** Cells inside the limits where the load meets a part or obstacle. */
  cut: number[][];
  /** Names of what the load meets inside the limits. */
  cutBy: string[];
  /** Boundary segments [x0, y0, x1, y1] by the limit that governs. */
  edges: Record<'tipping' | 'chart' | 'reach', number[]>;
  /** Share of the nodes that are inside, 0–1. */
  insideShare: number;
}

export function nodeShare(g: EnvelopeGrid, n: number): { share: number; chart: boolean } {
  const t = Math.min(g.ccw[n], g.cw[n]) / g.limits.tipping;
  const c = Number.isNaN(g.chart[Math.floor(n / g.nS)]) ? 0 : g.chart[Math.floor(n / g.nS)] / g.limits.chart;
  return c > t ? { share: c, chart: true } : { share: t, chart: false };
}

export function envelopeShapes(g: EnvelopeGrid): EnvelopeShapes {
  const { nR, nS } = g;
  const px = new Float64Array(nR * nS), py = new Float64Array(nR * nS), share = new Float64Array(nR * nS);
  const chartGoverns = new Uint8Array(nR * nS);
  let inside = 0;
  for (let j = 0; j < nR; j++) {
    for (let k = 0; k < nS; k++) {
      const n = j * nS + k;
      const a = (k * g.step * Math.PI) / 180 + g.offset[j];
      px[n] = g.radii[j] * Math.cos(a);
      py[n] = g.radii[j] * Math.sin(a);
      const s = nodeShare(g, n);
      share[n] = s.share;
      chartGoverns[n] = s.chart ? 1 : 0;
      if (s.share <= 1) inside++;
    }
  }
  const out: EnvelopeShapes = { bands: { ample: [], fair: [], near: [] }, cut: [], cutBy: [], edges: { tipping: [], chart: [], reach: [] }, insideShare: inside / (nR * nS) };
  const cutNames = new Set<string>();
  for (let j = 0; j + 1 < nR; j++) {
    for (let k = 0; k < nS; k++) {
      const q = [j * nS + k, j * nS + ((k + 1) % nS), (j + 1) * nS + ((k + 1) % nS), (j + 1) * nS + k];
      const poly: number[] = [];
      const cross: number[] = [];
      let outsideGov = 0;
      let worst = -Infinity;
      let sum = 0;
      let count = 0;
      for (let e = 0; e < 4; e++) {
        const a = q[e], b = q[(e + 1) % 4];
        const fa = share[a] - 1, fb = share[b] - 1;
        if (fa <= 0) {
          poly.push(px[a], py[a]);
          sum += share[a];
          count++;
        } else if (share[a] > worst) {
          worst = share[a];
          outsideGov = chartGoverns[a];
        }
        if ((fa <= 0) !== (fb <= 0) && Number.isFinite(fa) && Number.isFinite(fb)) {
          const t = fa / (fa - fb);
          const x = px[a] + t * (px[b] - px[a]), y = py[a] + t * (py[b] - py[a]);
          poly.push(x, y);
          cross.push(x, y);
        } else if ((fa <= 0) !== (fb <= 0)) {
          // An unloaded tip (Infinity) has no interpolation: the boundary is at the inside node.
          const x = fa <= 0 ? px[a] : px[b], y = fa <= 0 ? py[a] : py[b];
          poly.push(x, y);
          cross.push(x, y);
        }
      }
      if (count === 0) continue;
      const mean = sum / count;
      out.bands[mean > BAND_EDGES.near ? 'near' : mean > BAND_EDGES.fair ? 'fair' : 'ample'].push(poly);
      const cutter = q.map((n) => g.cut[n]).find((c) => c >= 0);
      if (cutter !== undefined) {
        out.cut.push(poly);
        cutNames.add(g.targets[cutter].name);
      }
      for (let c = 0; c + 3 < cross.length; c += 4) out.edges[outsideGov ? 'chart' : 'tipping'].push(cross[c], cross[c + 1], cross[c + 2], cross[c + 3]);
    }
  }
  // Where the region reaches the first or last row, the boom's reach bounds it.
  for (const j of [0, nR - 1]) {
    for (let k = 0; k < nS; k++) {
      const a = j * nS + k, b = j * nS + ((k + 1) % nS);
      if (share[a] <= 1 && share[b] <= 1) out.edges.reach.push(px[a], py[a], px[b], py[b]);
    }
  }
  out.cutBy = [...cutNames];
  return out;
}
