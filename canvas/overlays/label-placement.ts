/**
 * Places the plan's text pills so they do not cover one another. Each label has an anchor (the screen
 * point it describes) and a size; labels are placed in priority order, each at the first candidate spot
 * around its anchor that overlaps nothing already placed and stays inside the view. Spots further out
 * than the first ring carry a leader line back to the anchor. Pure and DOM-free: sizes come in measured.
 */

export interface LabelBox {
  x: number;
  y: number;
  w: number;
  h: number;
}

export interface LabelRequest {
  key: string;
  anchor: { x: number; y: number };
  w: number;
  h: number;
  /** Lower is placed first and gets the better spot. */
  priority: number;
  /** Fixed labels (notes a user placed) keep their box and only block others. */
  fixed?: LabelBox;
}

export interface PlacedLabel {
  key: string;
  box: LabelBox;
  /** Set when the label sits away from its anchor: draw a line from anchor to the box. */
  leader: { x: number; y: number } | null;
}

const GAP = 6;
/** Directions round the anchor, in order of preference: right-below first, as labels were drawn before. */
const DIRS: ((w: number, h: number, d: number) => { x: number; y: number })[] = [
  (_w, _h, d) => ({ x: d, y: d }),
  (_w, h, d) => ({ x: d, y: -h - d }),
  (w, _h, d) => ({ x: -w - d, y: d }),
  (w, h, d) => ({ x: -w - d, y: -h - d }),
  (w, _h, d) => ({ x: -w / 2, y: d + 4 }),
  (w, h, d) => ({ x: -w / 2, y: -h - d - 4 }),
  (_w, h, d) => ({ x: d + 4, y: -h / 2 }),
  (w, h, d) => ({ x: -w - d - 4, y: -h / 2 }),
];
/** Distances from the anchor tried for each direction; beyond the first a leader line is drawn. */
const RINGS = [GAP, 3 * GAP + 10, 6 * GAP + 24, 10 * GAP + 44];

export function overlapArea(a: LabelBox, b: LabelBox): number {
  const w = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
  const h = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
  return w > 0 && h > 0 ? w * h : 0;
}

function clampInto(b: LabelBox, view: { width: number; height: number }): LabelBox {
  const x = Math.min(Math.max(b.x, 2), Math.max(2, view.width - b.w - 2));
  const y = Math.min(Math.max(b.y, 2), Math.max(2, view.height - b.h - 2));
  return { ...b, x, y };
}

const inside = (b: LabelBox, view: { width: number; height: number }) => b.x >= 0 && b.y >= 0 && b.x + b.w <= view.width && b.y + b.h <= view.height;

/** Nearest point of a box to p (for the leader line's end). */
function nearestOnBox(b: LabelBox, p: { x: number; y: number }) {
  return { x: Math.min(Math.max(p.x, b.x), b.x + b.w), y: Math.min(Math.max(p.y, b.y), b.y + b.h) };
}

/**
 * `previous` maps a key to the candidate it took last time; that candidate is tried first so labels do
 * not hop between spots while the slew is scrubbed. The returned map is the one to pass next time.
 */
export function placeLabels(
  requests: LabelRequest[],
  view: { width: number; height: number },
  previous: ReadonlyMap<string, number> = new Map(),
): { placed: PlacedLabel[]; choice: Map<string, number> } {
  const taken: LabelBox[] = [];
  const placed: PlacedLabel[] = [];
  const choice = new Map<string, number>();
  for (const r of requests) if (r.fixed) {
    taken.push(r.fixed);
    placed.push({ key: r.key, box: r.fixed, leader: null });
  }
  const order = requests.filter((r) => !r.fixed).sort((a, b) => a.priority - b.priority);
  const count = DIRS.length * RINGS.length;
  const boxAt = (r: LabelRequest, i: number): LabelBox => {
    const o = DIRS[i % DIRS.length](r.w, r.h, RINGS[Math.floor(i / DIRS.length)]);
    return { x: r.anchor.x + o.x, y: r.anchor.y + o.y, w: r.w, h: r.h };
  };
  for (const r of order) {
    const prev = previous.get(r.key);
    const tries = prev !== undefined && prev < count ? [prev, ...Array.from({ length: count }, (_, i) => i).filter((i) => i !== prev)] : Array.from({ length: count }, (_, i) => i);
    let best = -1;
    let bestBox: LabelBox | null = null;
    let bestCost = Infinity;
    for (const i of tries) {
      const b = boxAt(r, i);
      if (!inside(b, view)) continue;
      const cost = taken.reduce((s, t) => s + overlapArea(b, t), 0);
      if (cost === 0) {
        best = i;
        bestBox = b;
        break;
      }
      if (cost < bestCost) {
        bestCost = cost;
        best = i;
        bestBox = b;
      }
    }
    // Nowhere inside the view (the anchor is at or past an edge): the first spot, pulled into view.
    if (!bestBox) {
      best = 0;
      bestBox = clampInto(boxAt(r, 0), view);
    }
    const far = best >= DIRS.length || Math.hypot(bestBox.x + bestBox.w / 2 - r.anchor.x, bestBox.y + bestBox.h / 2 - r.anchor.y) > bestBox.w / 2 + bestBox.h + 3 * GAP;
    taken.push(bestBox);
    choice.set(r.key, best);
    placed.push({ key: r.key, box: bestBox, leader: far ? nearestOnBox(bestBox, r.anchor) : null });
  }
  return { placed, choice };
}
