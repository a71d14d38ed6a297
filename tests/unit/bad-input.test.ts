import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as scenes from '@/app/api/scenes/route';
import * as scene from '@/app/api/scenes/[id]/route';
import * as training from '@/app/api/scenes/[id]/training/route';
import * as equipment from '@/app/api/equipment/route';
import * as equipmentOne from '@/app/api/equipment/[id]/route';
import * as users from '@/app/api/users/route';
import * as me from '@/app/api/me/route';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser } from '@/tests/setup/db';
import { buildTemplate, resetToTemplate } from '@/tests/setup/template-db';
import { addAccessFixtures, TITLES, TRUCKS, sceneIdByTitle, truckIdByUnit } from '@/tests/setup/fixtures';
import { snapshotDb } from '@/tests/setup/snapshot';
import { call, type Call } from '@/tests/setup/call';
import type { Handler } from '@/tests/setup/route-matrix';
import { HR4_SPEC } from '@/db/seed/demo-trucks';

/**
 * Bad input, route by route. Every case must answer the expected 4xx, name the field both in
 * `issues[].path` and in the `error` text, and leave every table exactly as it was.
 */

type Who = 'operator@harrow.example' | 'admin@harrow.example' | 'trainer@harrow.example';
interface BadCase extends Omit<Call, 'id' | 'body'> {
  name: string;
  who: Who;
  /** A literal path id, or a function of the fixture ids (resolved when the test runs). */
  id?: string | (() => string);
  body?: unknown;
  status: number;
  field: string;
}

const MB = 1024 * 1024;
const deep = (n: number) => '['.repeat(n) + ']'.repeat(n);
let ids: { draft: string; truck: string; otherTruck: number; retiredTruck: number };

const op = 'operator@harrow.example' as const;
const admin = 'admin@harrow.example' as const;
const post = (handler: Handler, who: Who, name: string, body: unknown, field: string, status = 400): BadCase => ({ name, who, handler, method: 'POST', body, field, status });
const put = (handler: Handler, who: Who, id: () => string, name: string, body: unknown, field: string, status = 400): BadCase => ({ name, who, handler, method: 'PUT', id, body, field, status });

const cases: BadCase[] = [
  // POST /api/scenes
  post(scenes.POST, op, 'malformed JSON', '{"title": "Coil', 'body'),
  post(scenes.POST, op, 'NaN is not JSON', '{"title": "Coil move", "equipmentProfileId": NaN}', 'body'),
  post(scenes.POST, op, 'empty body', '', 'body'),
  post(scenes.POST, op, 'JSON null', 'null', 'body'),
  post(scenes.POST, op, 'an array for the body', [{ title: 'Coil move' }], 'body'),
  post(scenes.POST, op, 'missing title', {}, 'title'),
  post(scenes.POST, op, 'title of the wrong type', { title: 42 }, 'title'),
  post(scenes.POST, op, 'title of spaces only', { title: '     ' }, 'title'),
  post(scenes.POST, op, 'title too long', { title: 'x'.repeat(121) }, 'title'),
  post(scenes.POST, op, 'a 1.9 MB title (under the body limit)', { title: 'x'.repeat(1.9 * MB) }, 'title'),
  post(scenes.POST, op, 'a 10 MB title', { title: 'x'.repeat(10 * MB) }, 'body', 413),
  post(scenes.POST, op, 'document as an array', { title: 'Coil move', document: [1, 2] }, 'document'),
  post(scenes.POST, op, 'document as a string', { title: 'Coil move', document: '{}' }, 'document'),
  post(scenes.POST, op, 'document over 1.5 MB', { title: 'Coil move', document: { notes: 'n'.repeat(1.6 * MB) } }, 'document'),
  post(scenes.POST, op, 'document nested 10,000 deep', `{"title":"Coil move","document":{"a":${deep(10000)}}}`, 'document'),
  post(scenes.POST, op, 'negative profile id', { title: 'Coil move', equipmentProfileId: -3 }, 'equipmentProfileId'),
  post(scenes.POST, op, 'fractional profile id', { title: 'Coil move', equipmentProfileId: 1.5 }, 'equipmentProfileId'),
  post(scenes.POST, op, 'profile id as a string', { title: 'Coil move', equipmentProfileId: '1' }, 'equipmentProfileId'),
  post(scenes.POST, op, 'profile id overflowing to Infinity', '{"title":"Coil move","equipmentProfileId":1e400}', 'equipmentProfileId'),
  post(scenes.POST, op, 'unknown profile id', { title: 'Coil move', equipmentProfileId: 987654 }, 'equipmentProfileId'),
  post(scenes.POST, op, 'another organisation’s profile', () => ({ title: 'Coil move', equipmentProfileId: ids.otherTruck }), 'equipmentProfileId'),
  post(scenes.POST, op, 'a retired profile', () => ({ title: 'Coil move', equipmentProfileId: ids.retiredTruck }), 'equipmentProfileId'),
  // PUT /api/scenes/[id]
  put(scene.PUT, op, () => ids.draft, 'missing revision', { title: 'Renamed' }, 'revision'),
  put(scene.PUT, op, () => ids.draft, 'revision as a string', { revision: '2', title: 'Renamed' }, 'revision'),
  put(scene.PUT, op, () => ids.draft, 'revision null', { revision: null }, 'revision'),
  put(scene.PUT, op, () => ids.draft, 'negative revision', { revision: -1 }, 'revision'),
  put(scene.PUT, op, () => ids.draft, 'revision zero', { revision: 0 }, 'revision'),
  put(scene.PUT, op, () => ids.draft, 'fractional revision', { revision: 1.5 }, 'revision'),
  put(scene.PUT, op, () => ids.draft, 'stale revision', { revision: 1, title: 'Overwrite attempt' }, 'revision', 409),
  put(scene.PUT, op, () => ids.draft, 'a revision from the future', { revision: 99, title: 'Overwrite attempt' }, 'revision', 409),
  put(scene.PUT, op, () => ids.draft, 'a field the client may not set', { revision: 2, status: 'approved' }, 'status'),
  put(scene.PUT, op, () => ids.draft, 'title too short', { revision: 2, title: 'ab' }, 'title'),
  put(scene.PUT, op, () => ids.draft, 'document as an array', { revision: 2, document: [] }, 'document'),
  put(scene.PUT, op, () => ids.draft, 'another organisation’s profile', () => ({ revision: 2, equipmentProfileId: ids.otherTruck }), 'equipmentProfileId'),
  put(scene.PUT, op, () => ids.draft, 'malformed JSON', '{"revision": 2,', 'body'),
  put(scene.PUT, op, () => ids.draft, 'a 10 MB document', { revision: 2, document: { notes: 'n'.repeat(10 * MB) } }, 'body', 413),
  // PUT /api/scenes/[id]/training
  put(training.PUT, 'trainer@harrow.example', () => ids.draft, 'flag as a string', { inTrainingSet: 'yes' }, 'inTrainingSet'),
  put(training.PUT, 'trainer@harrow.example', () => ids.draft, 'missing flag', {}, 'inTrainingSet'),
  // POST and PUT /api/equipment
  post(equipment.POST, admin, 'missing name', { spec: HR4_SPEC }, 'name'),
  post(equipment.POST, admin, 'name of the wrong type', { name: 7, spec: HR4_SPEC }, 'name'),
  post(equipment.POST, admin, 'spec as an array', { name: 'Unit 9 rotator', spec: [] }, 'spec'),
  post(equipment.POST, admin, 'missing spec', { name: 'Unit 9 rotator' }, 'spec'),
  post(equipment.POST, admin, 'unknown kind', { name: 'Unit 9 rotator', kind: 'crane', spec: HR4_SPEC }, 'kind'),
  post(equipment.POST, admin, 'unit number too long', { name: 'Unit 9 rotator', unitNumber: 'U'.repeat(21), spec: HR4_SPEC }, 'unitNumber'),
  post(equipment.POST, admin, 'in-service flag as a string', { name: 'Unit 9 rotator', inService: 'yes', spec: HR4_SPEC }, 'inService'),
  post(equipment.POST, admin, 'spec nested 5,000 deep', `{"name":"Unit 9 rotator","spec":{"a":${deep(5000)}}}`, 'spec'),
  post(equipment.POST, admin, 'a 10 MB name', { name: 'n'.repeat(10 * MB), spec: HR4_SPEC }, 'body', 413),
  put(equipmentOne.PUT, admin, () => ids.truck, 'name too short', { name: 'x', spec: HR4_SPEC, baseVersion: 1 }, 'name'),
  put(equipmentOne.PUT, admin, () => ids.truck, 'malformed JSON', '{"name":', 'body'),
  put(equipmentOne.PUT, admin, () => ids.truck, 'missing base version', { name: 'Unit 9 rotator', spec: HR4_SPEC }, 'baseVersion'),
  put(equipmentOne.PUT, admin, () => ids.truck, 'stale base version', { name: 'Unit 9 rotator', spec: HR4_SPEC, baseVersion: 7 }, 'baseVersion', 409),
  // POST /api/users and PATCH /api/me
  post(users.POST, admin, 'invalid e-mail', { name: 'New Hire', email: 'not-an-email', role: 'operator', password: 'long-enough-password' }, 'email'),
  post(users.POST, admin, 'e-mail already in use', { name: 'New Hire', email: 'Supervisor@Harrow.example', role: 'operator', password: 'long-enough-password' }, 'email', 409),
  post(users.POST, admin, 'unknown role', { name: 'New Hire', email: 'hire@harrow.example', role: 'owner', password: 'long-enough-password' }, 'role'),
  post(users.POST, admin, 'short password', { name: 'New Hire', email: 'hire@harrow.example', role: 'operator', password: 'short' }, 'password'),
  post(users.POST, admin, 'common password', { name: 'New Hire', email: 'hire@harrow.example', role: 'operator', password: 'Password1234!' }, 'password'),
  post(users.POST, admin, 'password over 72 bytes', { name: 'New Hire', email: 'hire@harrow.example', role: 'operator', password: 'é'.repeat(40) }, 'password'),
  post(users.POST, admin, 'password over 128 characters', { name: 'New Hire', email: 'hire@harrow.example', role: 'operator', password: 'x'.repeat(129) }, 'password'),
  post(users.POST, admin, 'missing name', { email: 'hire@harrow.example', role: 'operator', password: 'long-enough-password' }, 'name'),
  { name: 'units not offered', who: op, handler: me.PATCH, method: 'PATCH', body: { units: 'furlongs' }, field: 'units', status: 400 },
  { name: 'units missing', who: op, handler: me.PATCH, method: 'PATCH', body: {}, field: 'units', status: 400 },
  // GET /api/scenes query
  ...['page=2', 'after=%%%', 'after=not+a+cursor', 'before=a/b', 'pageSize=0', 'pageSize=101', 'pageSize=abc', 'pageSize=1.5', 'status=bogus', 'training=yes', `q=${'t'.repeat(121)}`, `title=${'t'.repeat(121)}`].map(
    (q): BadCase => ({ name: `query ${q.slice(0, 20)}`, who: op, handler: scenes.GET, method: 'GET', query: q, field: `query.${q.split('=')[0]}`, status: 400 }),
  ),
  // path ids that are not plain positive whole numbers
  ...['abc', '-1', '0', '1.5', '1e0', '0x10', ' 1', '99999999999999999999'].flatMap((id): BadCase[] => [
    { name: `scene id "${id}"`, who: op, handler: scene.GET, method: 'GET', id, field: 'params.id', status: 400 },
    { name: `scene id "${id}" on delete`, who: op, handler: scene.DELETE, method: 'DELETE', id, field: 'params.id', status: 400 },
    { name: `truck id "${id}" on update`, who: admin, handler: equipmentOne.PUT, method: 'PUT', id, body: { name: 'Unit 9 rotator', spec: HR4_SPEC, baseVersion: 1 }, field: 'params.id', status: 400 },
  ]),
];

beforeAll(async () => {
  await resetToTemplate(await buildTemplate(addAccessFixtures));
  ids = {
    draft: String(await sceneIdByTitle(TITLES.ownDraft)),
    truck: String(await truckIdByUnit(TRUCKS.harrow)),
    otherTruck: await truckIdByUnit(TRUCKS.cobalt),
    retiredTruck: await truckIdByUnit(TRUCKS.retired),
  };
  // One real save, so the draft is at revision 2 and a save based on revision 1 is stale.
  signInAs(await demoUser(op));
  const saved = await call({ handler: scene.PUT, method: 'PUT', id: ids.draft, body: { revision: 1, title: 'Coil transfer, Route 9 (saved once)' } });
  expect(saved.status).toBe(200);
  expect(saved.json.revision).toBe(2);
});

describe('bad input is refused, names the field, and changes nothing', () => {
  for (const c of cases) {
    it(`${c.method} · ${c.name} → ${c.status} naming ${c.field}`, async () => {
      signInAs(await demoUser(c.who));
      const before = await snapshotDb();
      const res = await call({
        ...c,
        id: typeof c.id === 'function' ? c.id() : c.id,
        body: typeof c.body === 'function' ? c.body() : c.body,
      });
      expect(res.status, res.text.slice(0, 300)).toBe(c.status);
      const paths = res.json.issues?.map((x) => x.path) ?? [];
      expect(paths).toContain(c.field);
      // Only the field under test is wrong, so no other field may be blamed.
      for (const p of paths) expect(p === c.field || p.startsWith(`${c.field}.`), `also blamed ${p}`).toBe(true);
      expect(String(res.json.error)).toContain(c.field);
      expect(await snapshotDb()).toEqual(before);
    });
  }
});
