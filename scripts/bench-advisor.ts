/**
 * npm run bench:advisor — not a test. The placement advisor on each demo scene (db/seed): its time, the
 * least margin of the scene's own placement and of the best placement it proposes, and how many
 * placements it scored with each engine mode (and how many it left out on their tipping/chart/power-line
 * ceiling, which could not beat the best it had). Target: ≤ 3 s per scene on this machine.
 */
import { advise } from '@/lib/advisor';
import { sceneDocumentSchema } from '@/lib/scene/schema';
import { truckModelFromSpec } from '@/lib/scene/truck/from-spec';
import { DEMO_SCENES } from '@/db/seed/demo-scenes';
import { DEMO_TRUCKS } from '@/db/seed/demo-trucks';

const fmt = (m: number) => (Number.isFinite(m) ? m.toFixed(4) : String(m));

export function demoSites() {
  return DEMO_SCENES.map((s, i) => {
    const truck = DEMO_TRUCKS.find((t) => t.unitNumber === s.truck)!;
    const model = truckModelFromSpec({ id: i + 1, version: 1, name: truck.name, unitNumber: truck.unitNumber, spec: truck.spec }, truck.spec);
    return { title: s.title, document: sceneDocumentSchema.parse(s.document), model };
  });
}

function main() {
  console.log('placement advisor on the demo scenes (target ≤ 3 s each)');
  for (const site of demoSites()) {
    const c0 = process.cpuUsage();
    const r = advise(site);
    const cpu = process.cpuUsage(c0);
    const best = r.proposals[0];
    console.log(`  ${site.title}`);
    console.log(`    time ${(r.elapsedMs / 1000).toFixed(2)} s wall, ${((cpu.user + cpu.system) / 1e6).toFixed(2)} s CPU; ${r.evaluations.coarse} coarse and ${r.evaluations.exact} exact analyses, ${r.evaluations.skipped} placements skipped on their ceiling`);
    console.log(`    own placement  least margin ${r.start ? `${fmt(r.start.leastMargin.margin)} (${r.start.leastMargin.check})` : 'cannot be analysed'}`);
    for (const p of r.proposals) {
      console.log(`    proposal ${p.rank}${p.current ? ' (the own placement)' : ''}  least margin ${fmt(p.leastMargin.margin)} (${p.leastMargin.check})  at x ${p.truck.x.toFixed(2)} y ${p.truck.y.toFixed(2)} heading ${p.truck.heading.toFixed(1)}°, legs ${p.legs.map((l) => `${l.id} ${l.stage}`).join(', ')}`);
    }
    if (best && r.start) console.log(`    best against own: ${best.leastMargin.margin >= r.start.leastMargin.margin ? '+' : ''}${fmt(best.leastMargin.margin - r.start.leastMargin.margin)}`);
  }
}

if (process.argv[1]?.endsWith('bench-advisor.ts')) main();
