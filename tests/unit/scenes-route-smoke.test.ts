import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { GET, POST } from '@/app/api/scenes/route';

beforeAll(async () => {
  await freshSeededDb();
});

describe('scenes route', () => {
  it('lists only the operator’s organisation and creates a scene', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const list = await (await GET(new Request('http://t/api/scenes'))).json();
    expect(list.items.map((s: { title: string }) => s.title).sort()).toEqual([
      'Coil transfer, Route 9 weigh station',
      'Overturned reefer trailer, Mill Creek on-ramp',
    ]);
    const res = await POST(new Request('http://t/api/scenes', { method: 'POST', body: JSON.stringify({ title: 'Tanker on its side' }), headers: { 'content-type': 'application/json' } }));
    expect(res.status).toBe(201);
    expect((await res.json()).revision).toBe(1);
  });

  it('answers 401 signed out and 400 naming the field for a short title', async () => {
    signInAs(null);
    expect((await GET(new Request('http://t/api/scenes'))).status).toBe(401);
    signInAs(await demoUser('operator@harrow.example'));
    const res = await POST(new Request('http://t/api/scenes', { method: 'POST', body: JSON.stringify({ title: 'x' }), headers: { 'content-type': 'application/json' } }));
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.issues[0].path).toBe('title');
    expect(body.error).toContain('title');
  });
});
