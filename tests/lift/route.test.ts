import { describe, expect, it, vi } from 'vitest';
import type { CurrentUser } from '@/lib/auth/current-user';

let user: CurrentUser | null = null;
vi.mock('@/lib/auth/current-user', () => ({ getCurrentUser: async () => user }));

import { POST } from '@/app/api/analyze/route';
import { squareOfPads } from './scenarios';

const operator: CurrentUser = {
  id: 1, organisationId: 1, organisationName: 'Harrow Ridge Recovery', role: 'operator',
  name: 'Dana Okafor (invented)', email: 'operator@harrow.example', units: 'imperial',
};
const post = (body: unknown) =>
  POST(new Request('http://t/api/analyze', { method: 'POST', headers: { 'content-type': 'application/json' }, body: typeof body === 'string' ? body : JSON.stringify(body) }));

describe('POST /api/analyze', () => {
  it('signed in: 200 with the real analysis', async () => {
    user = operator;
    const res = await post(squareOfPads({ swing: { from: 330, to: 30, direction: 'ccw' } }));
    expect(res.status).toBe(200);
    const body = await res.json();
    // Source: reference.md hand-checkable case, tipping load 10 000 kg → 50 % for 5 000 kg [derived].
    expect(body.worstCase.percentOfTipping).toBeCloseTo(50, 6);
    expect(body.worstCase.line).toBe('FR-FL');
    expect(body.checks.find((c: { id: string }) => c.id === 'stability').ok).toBe(true);
  });
  it('signed out: 401', async () => {
    user = null;
    expect((await post(squareOfPads())).status).toBe(401);
  });
  it('bad body: 400 naming the field', async () => {
    user = operator;
    const res = await post({ ...squareOfPads(), swing: { from: 0, to: 90, direction: 'sideways' } });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.issues.map((i: { path: string }) => i.path)).toContain('swing.direction');
    expect(body.error).toMatch(/swing\.direction/);
  });
  it('a number outside its physical range: 400 naming the field', async () => {
    // Source: issue 9 item 5 — a mass near 1e308 overflowed to 0 % and every check passed.
    user = operator;
    const res = await post({ ...squareOfPads(), masses: [{ id: 'carrier', mass: 1e308, x: 0, y: 0, z: 1 }] });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.issues.map((i: { path: string }) => i.path)).toContain('masses.0.mass');
  });
  it('engine error: 422 with its code', async () => {
    user = operator;
    const input = squareOfPads();
    const res = await post({ ...input, supports: input.supports.slice(0, 2) });
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.code).toBe('too-few-supports');
    expect(body.error).toMatch(/three supports/);
  });
});
