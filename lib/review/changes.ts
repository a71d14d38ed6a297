import type { SceneDocument } from '@/lib/scene/schema';
import type { SceneObject } from '@/lib/scene/objects';
import type { PlanFigures } from './figures';

/**
 * What changed between the revision a supervisor last reviewed and the one now submitted: objects added,
 * moved (how far, how much turned) or removed, what else about an object changed, and the site settings
 * (swing, ground, plan limits). Pure: two documents in, data out; the review page puts it into words.
 */
export interface ObjectChange {
  id: string;
  kind: SceneObject['kind'];
  label: string;
  change: 'added' | 'removed' | 'moved' | 'changed';
  /** Metres the reference point moved (moved only). */
  moved?: number;
  /** Degrees turned, signed, CCW positive (moved only). */
  turned?: number;
  /** What else changed, in words ("outriggers and cribbing", "weight"). */
  fields: string[];
}

export interface SceneChanges {
  objects: ObjectChange[];
  /** Site-level settings that changed, in words. */
  site: string[];
}

// Positions are kept to the millimetre and angles to a twentieth of a degree: below that a drag did not move anything.
const MOVE_EPS = 0.001;
const TURN_EPS = 0.05;

const FIELD_WORDS: Record<string, string> = {
  legs: 'outriggers and cribbing', boom: 'boom', profileId: 'truck profile', profileVersion: 'truck profile version', rigging: 'rigging',
  massKg: 'weight', massMode: 'how the weight is known', density: 'density', weightUncertainty: 'weight uncertainty', cg: 'centre of gravity',
  hang: 'hang below the boom tip', blockMassKg: 'hook block', shape: 'size', height: 'height', voltageKV: 'voltage', obstacleKind: 'kind',
  length: 'length', width: 'width', deckHeight: 'deck height', text: 'text', x2: 'far end', y2: 'far end', label: 'name', locked: 'lock',
};
const SITE_WORDS: Record<string, string> = { swing: 'swing path', soil: 'ground and its allowable pressure', limits: 'the plan’s own limits' };

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
const turnOf = (a: number, b: number) => ((((b - a) % 360) + 540) % 360) - 180;

export function sceneChanges(before: SceneDocument, after: SceneDocument): SceneChanges {
  const old = new Map(before.objects.map((o) => [o.id, o]));
  const now = new Map(after.objects.map((o) => [o.id, o]));
  const objects: ObjectChange[] = [];
  for (const o of after.objects) {
    const p = old.get(o.id);
    const base = { id: o.id, kind: o.kind, label: o.label };
    if (!p) {
      objects.push({ ...base, change: 'added', fields: [] });
      continue;
    }
    const moved = Math.hypot(o.x - p.x, o.y - p.y);
    const turned = turnOf(p.rotation, o.rotation);
    const a = p as Record<string, unknown>;
    const b = o as Record<string, unknown>;
    const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].filter((k) => !['id', 'x', 'y', 'rotation', 'kind'].includes(k) && !same(a[k], b[k]));
    const fields = [...new Set(keys.map((k) => FIELD_WORDS[k] ?? k))];
    if (moved > MOVE_EPS || Math.abs(turned) > TURN_EPS) objects.push({ ...base, change: 'moved', moved, turned, fields });
    else if (fields.length) objects.push({ ...base, change: 'changed', fields });
  }
  for (const o of before.objects) if (!now.has(o.id)) objects.push({ id: o.id, kind: o.kind, label: o.label, change: 'removed', fields: [] });
  const site = (Object.keys(SITE_WORDS) as (keyof typeof SITE_WORDS)[]).filter((k) => !same(before[k as keyof SceneDocument], after[k as keyof SceneDocument])).map((k) => SITE_WORDS[k]);
  return { objects, site };
}

export interface FigureChange {
  key: 'tipping' | 'ground' | 'clearance' | 'power-line' | 'load-chart' | 'rigging';
  before: number | null;
  after: number | null;
  unit: '%' | 'm';
  /** True when a bigger number is better (clearances); false for percentages of a limit. */
  higherIsBetter: boolean;
}

/** The headline figures of the two submissions side by side (both as the server stored them). */
export function figureChanges(before: PlanFigures, after: PlanFigures): FigureChange[] {
  const row = (key: FigureChange['key'], f: (x: PlanFigures) => number | null, unit: FigureChange['unit'], higherIsBetter: boolean): FigureChange => ({ key, before: f(before), after: f(after), unit, higherIsBetter });
  return [
    row('tipping', (x) => x.percentOfTipping, '%', false),
    row('ground', (x) => x.ground?.percent ?? null, '%', false),
    row('clearance', (x) => x.leastClearance?.distance ?? null, 'm', true),
    row('power-line', (x) => x.powerLine?.distance ?? null, 'm', true),
    row('load-chart', (x) => x.loadChartPercent, '%', false),
    row('rigging', (x) => x.riggingPercent, '%', false),
  ].filter((r) => r.before !== null || r.after !== null);
}
