/**
 * The drag half of the editor bench (issue 10 item 5): per drag frame, the engine input is derived from
 * the scene and validated. Times the validation a frame costs with a full zod parse and with the
 * incremental parse the editor uses (lib/lift/incremental-parse.ts), dragging one obstacle of the
 * 300-obstacle bench scene across 200 frames, and counts the full parses. Node, no browser.
 */
import { performance } from 'node:perf_hooks';
import { parseLiftInput, parseLiftInputIncremental, type ParseMemo } from '@/lib/lift';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import type { SceneDocument } from '@/lib/scene/schema';
import { DEMO_TRUCKS } from '@/db/seed/demo-trucks';

export function dragParseFigures(doc: SceneDocument, frames = 200) {
  const t = DEMO_TRUCKS[0];
  const model = truckModelFromProfile({ id: 1, version: 1, name: t.name, unitNumber: t.unitNumber, spec: t.spec });
  const moving = doc.objects.findIndex((o) => o.kind === 'obstacle');
  const framesDocs: SceneDocument[] = [];
  for (let f = 0; f < frames; f++) {
    const objects = doc.objects.map((o, i) => (i === moving ? { ...o, x: o.x + f * 0.02 } : o));
    framesDocs.push({ ...doc, objects } as SceneDocument);
  }
  const inputs = framesDocs.map((d) => {
    const lift = sceneToLiftInput(d, model);
    if (!lift.ok) throw new Error(`bench scene is not analysable: ${lift.problem.message}`);
    return lift.input;
  });
  const full: number[] = [];
  for (const input of inputs) {
    const t0 = performance.now();
    parseLiftInput(structuredClone(input));
    full.push(performance.now() - t0);
  }
  const inc: number[] = [];
  let memo: ParseMemo | null = null;
  let fullParses = 0;
  for (const input of inputs) {
    const copy = structuredClone(input);
    const t0 = performance.now();
    const p = parseLiftInputIncremental(copy, memo);
    inc.push(performance.now() - t0);
    memo = p.memo;
    if (p.parsed.includes('')) fullParses += 1;
  }
  const med = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  return { frames, fullMedian: med(full.slice(10)), incrementalMedian: med(inc.slice(10)), fullParses };
}
