import fs from 'node:fs';
import { prepareLift, analyzeLift, weightSensitivity } from '@/lib/lift';
for (const f of fs.readdirSync('tests/lift/fixtures/in')) {
  const input = JSON.parse(fs.readFileSync(`tests/lift/fixtures/in/${f}`,'utf8'));
  const p = prepareLift(input);
  weightSensitivity(p, 1);
  const t=performance.now(); const s = weightSensitivity(p, 1); const dt = performance.now()-t;
  console.log(f, dt.toFixed(1), 'ms', JSON.stringify(s.limits.map(l => [l.kind, l.subject, l.loadMass && +l.loadMass.toFixed(2), l.change && +l.change.toFixed(1), l.never])), 'first', s.first?.kind, s.first?.loadMass);
}
