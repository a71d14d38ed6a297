import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

/**
 * The layering rule (README, "How it is built") as a test: dependency-cruiser with the project's own
 * config over the source tree must find nothing, and the same config must catch each kind of break.
 */
const ROOT = path.resolve(__dirname, '../..');
const CONFIG = path.join(ROOT, '.dependency-cruiser.cjs');
const BIN = path.join(ROOT, 'node_modules/.bin/depcruise');
const SOURCE_DIRS = ['app', 'canvas', 'components', 'db', 'lib', 'migrations', 'scripts', 'types', 'proxy.ts'];

type Violation = { from: string; to: string; rule: { name: string }; cycle?: { name: string }[] };

function cruise(cwd: string, targets: string[]): Violation[] {
  let out: string;
  try {
    out = execFileSync(BIN, [...targets, '--config', CONFIG, '--output-type', 'json'], { cwd, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  } catch (e) {
    // A violated rule exits non-zero; the JSON report is still on stdout.
    out = (e as { stdout?: string }).stdout ?? '';
    if (!out) throw e;
  }
  return (JSON.parse(out) as { summary: { violations: Violation[] } }).summary.violations;
}

const tmp: string[] = [];
afterAll(() => tmp.forEach((d) => fs.rmSync(d, { recursive: true, force: true })));

function fixture(files: Record<string, string>): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'arcline-layers-'));
  tmp.push(dir);
  const all = { 'tsconfig.json': JSON.stringify({ compilerOptions: { module: 'esnext', moduleResolution: 'bundler', paths: { '@/*': ['./*'] } } }), ...files };
  for (const [name, text] of Object.entries(all)) {
    fs.mkdirSync(path.dirname(path.join(dir, name)), { recursive: true });
    fs.writeFileSync(path.join(dir, name), text);
  }
  return dir;
}

describe('layers', () => {
  it('the source tree keeps every layering rule and has no import cycle', () => {
    const violations = cruise(ROOT, SOURCE_DIRS);
    expect(violations.map((v) => `${v.rule.name}: ${v.from} -> ${v.to}`)).toEqual([]);
  }, 180_000);

  it('the same rules catch a cycle (type-only too), pure lib reaching db or glue, db reaching glue, and lib importing the editor', () => {
    const dir = fixture({
      'lib/scene/a.ts': "import type { B } from './b';\nexport type A = { b?: B };\n",
      'lib/scene/b.ts': "import type { A } from './a';\nexport type B = { a?: A };\n",
      'lib/units.ts': "import { rows } from '@/db/repo';\nexport const n = rows.length;\n",
      'lib/equipment/x.ts': "import { pin } from '@/lib/server/pin';\nexport const x = pin;\n",
      'lib/server/pin.ts': "import { rows } from '@/db/repo';\nexport const pin = rows[0];\n",
      'db/repo.ts': "export const rows: number[] = [];\n",
      'db/seed.ts': "import { pin } from '@/lib/server/pin';\nexport const s = pin;\n",
      'lib/scene/c.ts': "import { tool } from '@/canvas/tool';\nexport const c = tool;\n",
      'canvas/tool.ts': 'export const tool = 1;\n',
    });
    const found = cruise(dir, ['lib', 'db', 'canvas']).map((v) => `${v.rule.name}: ${v.from} -> ${v.to}`);
    expect(found).toEqual(
      expect.arrayContaining([
        'no-cycles: lib/scene/a.ts -> lib/scene/b.ts',
        'lib-pure-stays-pure: lib/units.ts -> db/repo.ts',
        'lib-pure-stays-pure: lib/equipment/x.ts -> lib/server/pin.ts',
        'db-uses-pure-lib-only: db/seed.ts -> lib/server/pin.ts',
        'no-ui-below-app: lib/scene/c.ts -> canvas/tool.ts',
      ]),
    );
    // Server glue may use db: that edge is allowed.
    expect(found.filter((f) => f.includes('lib/server/pin.ts -> db/repo.ts'))).toEqual([]);
  }, 180_000);
});
