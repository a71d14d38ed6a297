import { analyzePrepared, analyzeAtSlew, isLiftError, parseLiftInputIncremental, prepareLift, type ParseMemo, type PreparedLift, type SlewSnapshot } from '@/lib/lift';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckObject } from '@/lib/scene/objects';
import type { EditorStore } from '../store/editor-store';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import type { LiveAnalysis } from './live-analysis-types';

const truckOf = (d: SceneDocument) => d.objects.find((o): o is TruckObject => o.kind === 'truck');

/** True when b differs from a only in the truck's current slew (the scrubber's case). */
export function sameExceptSlew(a: SceneDocument, b: SceneDocument): boolean {
  if (a === b) return true;
  if (a.swing !== b.swing || a.soil !== b.soil || a.limits !== b.limits || a.objects.length !== b.objects.length) return false;
  for (let i = 0; i < a.objects.length; i++) {
    const x = a.objects[i];
    const y = b.objects[i];
    if (x === y) continue;
    if (x.kind !== 'truck' || y.kind !== 'truck') return false;
    const { boom: bx, ...rx } = x;
    const { boom: by, ...ry } = y;
    if (bx.length !== by.length || bx.elevation !== by.elevation) return false;
    for (const k of Object.keys(rx) as (keyof typeof rx)[]) if (rx[k] !== ry[k]) return false;
  }
  return true;
}

/**
 * The engine input of `doc`, prepared. `memo` carries the last frame's parsed input, so a drag parses only
 * the parts of the input it changed (issue 10 item 5: no full zod parse per frame).
 */
export function prepareScene(
  doc: SceneDocument,
  model: TruckModel | null,
  memo: { current: ParseMemo | null } = { current: null },
): Pick<LiveAnalysis, 'lift' | 'prepared' | 'error'> {
  const lift = sceneToLiftInput(doc, model);
  if (!lift.ok) return { lift, prepared: null, error: null };
  try {
    const parsed = parseLiftInputIncremental(lift.input, memo.current);
    memo.current = parsed.memo;
    return { lift, prepared: prepareLift(parsed.input), error: null };
  } catch (e) {
    if (isLiftError(e)) return { lift, prepared: null, error: { code: e.code, message: e.message } };
    throw e;
  }
}

function fullResult(a: LiveAnalysis): Pick<LiveAnalysis, 'result' | 'error'> {
  if (!a.lift.ok || !a.prepared) return { result: null, error: a.error };
  try {
    return { result: analyzePrepared(a.prepared), error: null };
  } catch (e) {
    if (isLiftError(e)) return { result: null, error: { code: e.code, message: e.message } };
    throw e;
  }
}

function snapshotAt(prepared: PreparedLift | null, slew: number | null): SlewSnapshot | null {
  return prepared && slew !== null ? analyzeAtSlew(prepared, slew) : null;
}

/**
 * Keeps `analysis` in the store in step with the document. A slew-only change costs one analyzeAtSlew;
 * any other change re-prepares at once and runs the full swing analysis when no drag is in progress
 * (`deferFull` lets the browser paint first; tests run it at once).
 */
export function attachLiveAnalysis(store: EditorStore, opts: { deferFull?: (run: () => void) => void } = {}): () => void {
  let lastDoc: SceneDocument | null = null;
  let lastModel: TruckModel | null | undefined;
  let lastSlew: number | null | undefined;
  let fullPending = false;
  let generation = 0;
  const parseMemo: { current: ParseMemo | null } = { current: null };

  const runFull = (gen: number) => {
    fullPending = false;
    const s = store.getState();
    if (!s.analysis || s.gestureBase) return;
    // The document moved on while this waited: schedule the current one instead.
    if (gen !== generation) return step();
    store.getState().set({ analysis: { ...s.analysis, ...fullResult(s.analysis) } });
  };

  let busy = false;
  /** Our own set() calls notify this listener again; one pass at a time handles everything. */
  const guarded = (fn: () => void) => {
    if (busy) return;
    busy = true;
    try {
      fn();
    } finally {
      busy = false;
    }
  };
  const update = () => guarded(step);
  const step = () => {
    const s = store.getState();
    const doc = s.document;
    const truck = truckOf(doc);
    const slew = truck ? (s.scrubSlew ?? truck.boom.slew) : null;
    const docChanged = doc !== lastDoc || s.truck !== lastModel;
    if (!docChanged && slew === lastSlew && !(s.analysis && !s.analysis.result && !s.gestureBase && !fullPending && s.analysis.prepared)) return;
    const slewOnly = !!lastDoc && s.truck === lastModel && sameExceptSlew(lastDoc, doc);
    lastDoc = doc;
    lastModel = s.truck;
    lastSlew = slew;
    if (slewOnly && s.analysis) {
      store.getState().set({ analysis: { ...s.analysis, slew, snapshot: snapshotAt(s.analysis.prepared, slew) } });
    } else if (docChanged) {
      generation += 1;
      const p = prepareScene(doc, s.truck, parseMemo);
      store.getState().set({ analysis: { ...p, result: null, snapshot: snapshotAt(p.prepared, slew), slew } });
    } else if (s.analysis) {
      store.getState().set({ analysis: { ...s.analysis, slew, snapshot: snapshotAt(s.analysis.prepared, slew) } });
    }
    const a = store.getState().analysis;
    if (a && a.prepared && !a.result && !store.getState().gestureBase && !fullPending) {
      fullPending = true;
      const gen = generation;
      if (opts.deferFull) opts.deferFull(() => guarded(() => runFull(gen)));
      else runFull(gen);
    }
  };
  update();
  return store.subscribe(update);
}
