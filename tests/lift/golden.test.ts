import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyzeLift } from '@/lib/lift';

/**
 * Golden fixtures: fixtures/in/*.json → fixtures/out/*.json. Regenerate only on purpose, after checking
 * the change is intended: REGEN=1 npx vitest run tests/lift/golden.test.ts
 */
const dir = path.join(__dirname, 'fixtures');
const names = fs.readdirSync(path.join(dir, 'in')).filter((f) => f.endsWith('.json')).sort();

/** Compares JSON trees; numbers agree to 1e-9 relative (or 1e-9 absolute near zero). */
function diff(a: unknown, b: unknown, at = ''): string | null {
  if (typeof a === 'number' && typeof b === 'number') {
    return Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b)) ? null : `${at}: ${a} ≠ ${b}`;
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return `${at}: length ${a.length} ≠ ${b.length}`;
    for (let i = 0; i < a.length; i++) {
      const d = diff(a[i], b[i], `${at}[${i}]`);
      if (d) return d;
    }
    return null;
  }
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const k of keys) {
      const d = diff((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${at}.${k}`);
      if (d) return d;
    }
    return null;
  }
  return Object.is(a, b) ? null : `${at}: ${JSON.stringify(a)} ≠ ${JSON.stringify(b)}`;
}

describe('golden fixtures', () => {
  it('has fixtures', () => expect(names.length).toBeGreaterThanOrEqual(5));
  for (const name of names) {
    it(name, () => {
      const input = JSON.parse(fs.readFileSync(path.join(dir, 'in', name), 'utf8'));
      const actual = JSON.parse(JSON.stringify(analyzeLift(input)));
      const outFile = path.join(dir, 'out', name);
      if (process.env.REGEN === '1') {
        fs.writeFileSync(outFile, JSON.stringify(actual, null, 2) + '\n');
        return;
      }
      const expected = JSON.parse(fs.readFileSync(outFile, 'utf8'));
      expect(diff(actual, expected)).toBeNull();
    });
  }
});
