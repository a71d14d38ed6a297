import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.join(__dirname, '..', '..');
const run = (file: string, ...args: string[]) =>
  spawnSync(process.execPath, [path.join(root, 'node_modules', 'tsx', 'dist', 'cli.mjs'), 'scripts/analyze.ts', file, ...args], { cwd: root, encoding: 'utf8' });

describe('npm run analyze', () => {
  it('prints the result JSON for the README example', () => {
    const out = run('examples/lift/coil-transfer.json');
    expect(out.status).toBe(0);
    const result = JSON.parse(out.stdout);
    expect(result.checks.length).toBeGreaterThan(10);
    // The FR leg is partly extended: the worst case lies strictly inside the 300° → 235° clockwise arc.
    expect(result.worstCase.slew).toBeLessThan(300);
    expect(result.worstCase.slew).toBeGreaterThan(235);
    // The weight sensitivity: the load mass at which each limit is reached.
    const ws = result.weightSensitivity;
    expect(ws.loadMass).toBe(7990);
    const kinds = ws.limits.map((l: { kind: string }) => l.kind);
    expect(kinds).toEqual(expect.arrayContaining(['tipping-limit', 'tipping', 'load-chart', 'bearing', 'rigging']));
    // Percent of tipping is proportional to the hook load (tipping.ts), so the 85 % mass is 85/100 of the 100 % one plus the block and rigging share.
    const at = (k: string) => ws.limits.find((l: { kind: string }) => l.kind === k).loadMass;
    const extra = result.hook.hookLoad - ws.loadMass;
    expect((at('tipping-limit') + extra) / (at('tipping') + extra)).toBeCloseTo(0.85, 9);
  });
  it('bad input: names the field on stderr, exit code 2', () => {
    const input = JSON.parse(fs.readFileSync(path.join(root, 'examples/lift/coil-transfer.json'), 'utf8'));
    input.boom.cgFraction = 'middle';
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'arcline-cli-')), 'bad.json');
    fs.writeFileSync(file, JSON.stringify(input));
    const out = run(file);
    expect(out.status).toBe(2);
    expect(out.stderr).toMatch(/boom\.cgFraction/);
    expect(out.stdout).toBe('');
  });
  it('refuses a step under 0.01° instead of running out of memory', () => {
    // Source: issue 9 item 5 (--step 1e-7 ran out of heap).
    const out = run('examples/lift/coil-transfer.json', '--step', '1e-7');
    expect(out.status).toBe(2);
    expect(out.stderr).toMatch(/--step must be a number of degrees from 0\.01 to 1/);
    expect(out.stdout).toBe('');
  });
});
