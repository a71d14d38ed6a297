import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { GET as list, POST as create } from '@/app/api/equipment/route';
import { GET as getOne, PUT as update, DELETE as remove } from '@/app/api/equipment/[id]/route';
import { GET as versions } from '@/app/api/equipment/[id]/versions/route';
import { GET as version } from '@/app/api/equipment/[id]/versions/[version]/route';
import { POST as duplicate } from '@/app/api/equipment/[id]/duplicate/route';
import { POST as retire } from '@/app/api/equipment/[id]/retire/route';
import { HR7_SPEC } from '@/db/seed/demo-trucks';
import { truckSpecSchema } from '@/lib/equipment/truck-spec-rules';

const ctx = (params: Record<string, string>) => ({ params: Promise.resolve(params) });
const json = (method: string, body: unknown) => ({ method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } });
const url = 'http://t/api/equipment';

let hr7Id: number;
let cf2Id: number;

beforeAll(async () => {
  await freshSeededDb();
  signInAs(await demoUser('admin@harrow.example'));
  const items = (await (await list(new Request(url))).json()).items;
  hr7Id = items.find((p: { unitNumber: string }) => p.unitNumber === 'HR-7').id;
  signInAs(await demoUser('operator@cobalt.example'));
  cf2Id = (await (await list(new Request(url))).json()).items[0].id;
});

describe('equipment routes: reading', () => {
  it('lists the organisation’s seeded trucks with valid specs, and nothing of the other organisation', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const items = (await (await list(new Request(url))).json()).items;
    expect(items.map((p: { unitNumber: string }) => p.unitNumber)).toEqual(['HR-4', 'HR-7']);
    for (const p of items) expect(truckSpecSchema.safeParse(p.spec).success).toBe(true);
  });
  it('answers 404 for another organisation’s profile, its versions and a version', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    expect((await getOne(new Request(`${url}/${cf2Id}`), ctx({ id: String(cf2Id) }))).status).toBe(404);
    expect((await versions(new Request(`${url}/${cf2Id}/versions`), ctx({ id: String(cf2Id) }))).status).toBe(404);
    expect((await version(new Request(`${url}/${cf2Id}/versions/1`), ctx({ id: String(cf2Id), version: '1' }))).status).toBe(404);
  });
  it('answers 401 signed out', async () => {
    signInAs(null);
    expect((await list(new Request(url))).status).toBe(401);
  });
});

describe('equipment routes: writing (admin only)', () => {
  it('refuses an operator: 403 on create, update, duplicate and retire', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const body = { name: 'Test truck', unitNumber: 'T-1', spec: HR7_SPEC };
    expect((await create(new Request(url, json('POST', body)))).status).toBe(403);
    expect((await update(new Request(`${url}/${hr7Id}`, json('PUT', { ...body, baseVersion: 1 })), ctx({ id: String(hr7Id) }))).status).toBe(403);
    expect((await duplicate(new Request(`${url}/${hr7Id}/duplicate`, json('POST', {})), ctx({ id: String(hr7Id) }))).status).toBe(403);
    expect((await retire(new Request(`${url}/${hr7Id}/retire`, { method: 'POST' }), ctx({ id: String(hr7Id) }))).status).toBe(403);
  });

  it('refuses an invalid spec with 400 naming the field', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const bad = structuredClone(HR7_SPEC);
    bad.boom.stages[1].length = 15;
    const res = await create(new Request(url, json('POST', { name: 'Bad truck', spec: bad })));
    expect(res.status).toBe(400);
    const out = await res.json();
    expect(out.issues).toContainEqual({ path: 'spec.boom.stages.1.length', message: expect.stringContaining('must be shorter than the next stage') });
    expect(out.error).toContain('spec.boom.stages.1.length');
  });

  it('creates, updates with a new version kept, loads the old version exactly, and refuses a stale edit', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const res = await create(new Request(url, json('POST', { name: 'Shop test truck', unitNumber: 'HR-9', spec: HR7_SPEC })));
    expect(res.status).toBe(201);
    const p = await res.json();
    expect(p.version).toBe(1);
    const id = String(p.id);
    const heavier = structuredClone(HR7_SPEC);
    heavier.carrier.mass = 20500;
    const up = await update(new Request(`${url}/${id}`, json('PUT', { name: 'Shop test truck', unitNumber: 'HR-9', spec: heavier, baseVersion: 1 })), ctx({ id }));
    expect(up.status).toBe(200);
    expect((await up.json()).version).toBe(2);
    const hist = (await (await versions(new Request(`${url}/${id}/versions`), ctx({ id }))).json()).items;
    expect(hist.map((v: { version: number; authorName: string }) => [v.version, v.authorName])).toEqual([
      [2, 'Sol Brennan'],
      [1, 'Sol Brennan'],
    ]);
    const v1 = await (await version(new Request(`${url}/${id}/versions/1`), ctx({ id, version: '1' }))).json();
    expect(v1.spec.carrier.mass).toBe(19500);
    const v2 = await (await version(new Request(`${url}/${id}/versions/2`), ctx({ id, version: '2' }))).json();
    expect(v2.spec.carrier.mass).toBe(20500);
    const stale = await update(new Request(`${url}/${id}`, json('PUT', { name: 'Shop test truck', spec: HR7_SPEC, baseVersion: 1 })), ctx({ id }));
    expect(stale.status).toBe(409);
    expect((await stale.json()).error).toContain('now at version 2');
    expect((await version(new Request(`${url}/${id}/versions/3`), ctx({ id, version: '3' }))).status).toBe(404);
  });

  it('duplicates a profile as a new version-1 profile and retires one', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const d = await duplicate(new Request(`${url}/${hr7Id}/duplicate`, json('POST', { unitNumber: 'HR-8' })), ctx({ id: String(hr7Id) }));
    expect(d.status).toBe(201);
    const copy = await d.json();
    expect(copy).toMatchObject({ name: '50-ton rotator (example values) (copy)', unitNumber: 'HR-8', version: 1 });
    expect(copy.spec).toEqual(HR7_SPEC);
    const cid = String(copy.id);
    expect((await retire(new Request(`${url}/${cid}/retire`, { method: 'POST' }), ctx({ id: cid }))).status).toBe(200);
    expect((await remove(new Request(`${url}/${cid}`, { method: 'DELETE' }), ctx({ id: cid }))).status).toBe(409);
    const active = (await (await list(new Request(url))).json()).items.map((p: { id: number }) => p.id);
    expect(active).not.toContain(copy.id);
    const all = (await (await list(new Request(`${url}?includeRetired=true`))).json()).items.map((p: { id: number }) => p.id);
    expect(all).toContain(copy.id);
    const edit = await update(new Request(`${url}/${cid}`, json('PUT', { name: 'x y', spec: HR7_SPEC, baseVersion: 1 })), ctx({ id: cid }));
    expect(edit.status).toBe(409);
  });

  it('answers 404 when an admin writes to another organisation’s profile', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const id = String(cf2Id);
    expect((await update(new Request(`${url}/${id}`, json('PUT', { name: 'Taken over', spec: HR7_SPEC, baseVersion: 1 })), ctx({ id }))).status).toBe(404);
    expect((await retire(new Request(`${url}/${id}/retire`, { method: 'POST' }), ctx({ id }))).status).toBe(404);
    expect((await duplicate(new Request(`${url}/${id}/duplicate`, json('POST', {})), ctx({ id }))).status).toBe(404);
  });
});
