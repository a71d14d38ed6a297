/**
 * Plan PDF benchmark: seeds the demo into a throwaway database, then for each demo plan loads its data (the
 * server's analysis of the revision included) and renders the PDF several times. Prints the load and render
 * times (median, and the first render, which pays for font loading) and the size. Figures, not a test.
 * Run: npm run bench:pdf
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'arcline-bench-pdf-'));
process.env.DATABASE_FILE = path.join(dir, 'bench.db');

const RUNS = 5;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  const { getDb } = await import('../db');
  const { migrateToLatest } = await import('../db/migrator');
  const { seedDemo } = await import('../db/seed/run-seed');
  const { findUserById } = await import('../db/repositories/users');
  const { loadPlanData } = await import('../app/api/scenes/[id]/load-plan');
  const { renderPlanPdf } = await import('../components/plan-pdf/render');
  const db = getDb();
  await migrateToLatest(db);
  await seedDemo(db);
  const scenes = await db.selectFrom('scenes').select(['id', 'title', 'owner_id']).orderBy('id').execute();
  // Wall time suffers when other work shares the cores; the process's own CPU time is printed beside it.
  console.log(`Plan PDF bench (${os.cpus().length} cores, load average ${os.loadavg()[0].toFixed(1)}, ${RUNS} renders per plan; budget 1,500 ms and 1 MB)`);
  for (const s of scenes) {
    const u = (await findUserById(db, s.owner_id))!;
    const user = { id: u.id, organisationId: u.organisation_id, organisationName: u.organisation_name, role: u.role, name: u.name, email: u.email, units: u.units };
    const loads: number[] = [];
    const renders: number[] = [];
    const cpu: number[] = [];
    let bytes = 0;
    for (let i = 0; i < RUNS; i++) {
      const t0 = performance.now();
      const data = await loadPlanData(db, user, s.id, undefined);
      const t1 = performance.now();
      const c1 = process.cpuUsage();
      const pdf = await renderPlanPdf(data);
      const c2 = process.cpuUsage(c1);
      const t2 = performance.now();
      cpu.push((c2.user + c2.system) / 1000);
      loads.push(t1 - t0);
      renders.push(t2 - t1);
      bytes = pdf.length;
    }
    const total = loads.map((l, i) => l + renders[i]);
    console.log(
      `${s.title}: load ${median(loads).toFixed(0)} ms, render ${median(renders).toFixed(0)} ms (CPU ${median(cpu).toFixed(0)} ms; first ${renders[0].toFixed(0)} ms), ` +
        `total median ${median(total).toFixed(0)} ms = ${(median(total) / 1500).toFixed(2)} of budget; ${(bytes / 1024).toFixed(0)} KB = ${(bytes / 1048576).toFixed(3)} of 1 MB`,
    );
  }
  fs.rmSync(dir, { recursive: true, force: true });
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
