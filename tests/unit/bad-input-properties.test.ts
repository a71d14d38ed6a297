import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import fc from 'fast-check';
import * as scenes from '@/app/api/scenes/route';
import * as scene from '@/app/api/scenes/[id]/route';
import { getDb } from '@/db';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser } from '@/tests/setup/db';
import { buildTemplate, resetToTemplate } from '@/tests/setup/template-db';
import { TRUCKS, truckIdByUnit } from '@/tests/setup/fixtures';
import { rowCount, snapshotDb } from '@/tests/setup/snapshot';
import { call } from '@/tests/setup/call';
import { storedSceneDocumentSchema } from '@/lib/scene/parse';
import { emptySceneDocument } from '@/lib/scene';

/**
 * Generated bodies, ids and queries. The oracle for "valid" is written out here from the rules (title 3–120
 * characters after trimming, a profile id that is this organisation's truck in service), not taken from the
 * route's schema. The document's contents belong to the editor's schema, so that schema is the oracle for
 * the document alone: the route must accept what it accepts and store exactly what it produces.
 */

let ownTruck: number;
let otherTruck: number;

beforeAll(async () => {
  await resetToTemplate(await buildTemplate());
  ownTruck = await truckIdByUnit(TRUCKS.harrow);
  otherTruck = await truckIdByUnit(TRUCKS.cobalt);
  signInAs(await demoUser('operator@harrow.example'));
});

const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

const documentOk = (d: unknown) => isPlainObject(d) && storedSceneDocumentSchema.safeParse(d).success;

function expectedValid(body: unknown): boolean {
  if (!isPlainObject(body)) return false;
  const { title, document, equipmentProfileId } = body;
  if (typeof title !== 'string' || title.trim().length < 3 || title.trim().length > 120) return false;
  if (document !== undefined && !documentOk(document)) return false;
  return equipmentProfileId === undefined || equipmentProfileId === null || equipmentProfileId === ownTruck;
}

// zod drops a "__proto__" key rather than storing it; such keys are left out so documents round-trip.
const key = fc.string({ maxLength: 8 }).filter((k) => k !== '__proto__');
const value = fc.oneof(fc.jsonValue({ maxDepth: 3 }), fc.json({ maxDepth: 2 }));
const anyTitle = fc.oneof({ arbitrary: fc.string({ maxLength: 130 }), weight: 3 }, fc.json({ maxDepth: 1 }), fc.integer(), fc.constant(null), fc.constant('   ok   '));
// Valid documents carry notes whose text may itself look like JSON ("[1]", "{}"): it must come back as text.
const noteText = fc.oneof(fc.string({ maxLength: 40 }), fc.json({ maxDepth: 2 }).filter((j) => j.length <= 2000));
const note = fc.record({ id: fc.uuid(), kind: fc.constant('note'), x: fc.double({ min: -500, max: 500, noNaN: true }), y: fc.integer({ min: -500, max: 500 }), text: noteText });
const validDocument = fc.array(note, { maxLength: 3 }).map((objects) => ({ ...emptySceneDocument(), objects }));
const anyDocument = fc.oneof({ arbitrary: validDocument, weight: 3 }, fc.dictionary(key, value, { maxKeys: 5 }), fc.jsonValue({ maxDepth: 2 }));
const anyProfileId = fc.oneof({ arbitrary: fc.constant(undefined), weight: 4 }, fc.constant(null), fc.constantFrom(0, -1, 1.5, 987654), fc.integer(), fc.string({ maxLength: 3 }));
const sceneBody = fc.oneof(
  { arbitrary: fc.record({ title: anyTitle, document: anyDocument, equipmentProfileId: anyProfileId }, { requiredKeys: [] }), weight: 4 },
  fc.jsonValue({ maxDepth: 3 }),
);

describe('POST /api/scenes with generated bodies', () => {
  it('creates exactly when the body is valid, stores what was sent, and otherwise answers 4xx and writes nothing', async () => {
    let created = 0;
    await fc.assert(
      fc.asyncProperty(sceneBody, fc.boolean(), async (raw, useOwnTruck) => {
        const body = isPlainObject(raw) && useOwnTruck ? { ...raw, equipmentProfileId: ownTruck } : raw;
        const before = await snapshotDb();
        const res = await call({ handler: scenes.POST, method: 'POST', body });
        if (expectedValid(body)) {
          expect(res.status, res.text.slice(0, 200)).toBe(201);
          const b = body as { title: string; document?: unknown; equipmentProfileId?: number | null };
          expect(res.json.title).toBe(b.title.trim());
          const want = b.document === undefined ? emptySceneDocument() : storedSceneDocumentSchema.parse(b.document);
          expect(res.json.document).toEqual(want);
          expect(res.json.equipmentProfileId).toBe(b.equipmentProfileId ?? null);
          const stored = await getDb().selectFrom('scenes').select(['title', 'document']).where('id', '=', res.json.id as number).executeTakeFirstOrThrow();
          expect(stored.title).toBe(b.title.trim());
          expect(stored.document).toEqual(want);
          created++;
        } else {
          expect(res.status, res.text.slice(0, 200)).toBeGreaterThanOrEqual(400);
          expect(res.status).toBeLessThan(500);
          expect(res.json.issues?.length).toBeGreaterThan(0);
          expect(await snapshotDb()).toEqual(before);
        }
      }),
      { numRuns: 100 },
    );
    // Both branches must have been exercised, or the property says little.
    expect(created).toBeGreaterThan(5);
    expect(created).toBeLessThan(95);
  });

  it('never answers 500 to arbitrary text, and writes nothing unless it parsed to a valid body', async () => {
    const text = fc.oneof(fc.string({ maxLength: 60 }), fc.json().map((j) => j.slice(0, Math.max(1, j.length - 1))), fc.json());
    await fc.assert(
      fc.asyncProperty(text, async (t) => {
        const scenesBefore = await rowCount('scenes');
        const res = await call({ handler: scenes.POST, method: 'POST', body: t });
        let parsed: unknown = Symbol('unparsable');
        try {
          parsed = JSON.parse(t);
        } catch {
          /* stays unparsable */
        }
        if (expectedValid(parsed)) expect(res.status).toBe(201);
        else {
          expect([400, 413]).toContain(res.status);
          expect(await rowCount('scenes')).toBe(scenesBefore);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('a profile of another organisation is refused like an unknown one', async () => {
    const res = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Cross-org truck', equipmentProfileId: otherTruck } });
    expect(res.status).toBe(400);
    expect(res.json.error).toBe('equipmentProfileId: no such truck profile in your organisation');
  });
});

describe('PUT /api/scenes/[id] with generated bodies', () => {
  it('saves only a body with the current revision and valid fields; everything else is a 4xx with no write', async () => {
    const created = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Property target' } });
    const id = String(created.json.id);
    const body = fc.record(
      {
        // The current revision is drawn often enough that the save branch is exercised on every run.
        revision: fc.oneof({ arbitrary: fc.constant('current'), weight: 6 }, fc.integer({ min: -2, max: 5 }), fc.double(), fc.string({ maxLength: 2 }), fc.constant(null)),
        title: anyTitle,
        document: anyDocument,
      },
      { requiredKeys: [] },
    );
    let saved = 0;
    await fc.assert(
      fc.asyncProperty(body, async (raw) => {
        const current = (await getDb().selectFrom('scenes').select('revision').where('id', '=', Number(id)).executeTakeFirstOrThrow()).revision;
        const sent = raw.revision === 'current' ? { ...raw, revision: current } : raw;
        const valid =
          sent.revision === current &&
          (sent.title === undefined || (typeof sent.title === 'string' && sent.title.trim().length >= 3 && sent.title.trim().length <= 120)) &&
          (sent.document === undefined || documentOk(sent.document));
        const before = await snapshotDb();
        const res = await call({ handler: scene.PUT, method: 'PUT', id, body: sent });
        if (valid) {
          expect(res.status, res.text.slice(0, 200)).toBe(200);
          expect(res.json.revision).toBe(current + 1);
          saved++;
        } else {
          expect(res.status, res.text.slice(0, 200)).toBeGreaterThanOrEqual(400);
          expect(res.status).toBeLessThan(500);
          expect(await snapshotDb()).toEqual(before);
        }
      }),
      { numRuns: 80 },
    );
    expect(saved).toBeGreaterThan(3);
  });
});

describe('generated path ids and list queries', () => {
  it('a path id is either a plain positive number (200 or 404) or a 400 naming params.id; never a 500', async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(fc.string({ maxLength: 12 }), fc.integer().map(String), fc.double().map(String)), async (id) => {
        const res = await call({ handler: scene.GET, method: 'GET', id });
        if (/^[1-9][0-9]{0,14}$/.test(id)) expect([200, 404]).toContain(res.status);
        else {
          expect(res.status).toBe(400);
          expect(res.json.issues?.[0].path).toBe('params.id');
        }
      }),
      { numRuns: 200 },
    );
  });

  it('list queries answer 200 or a 400 naming a query field; never a 500', async () => {
    const param = fc.tuple(fc.constantFrom('page', 'pageSize', 'q', 'title', 'status', 'training', 'sort', 'dir', 'after', 'before', 'other'), fc.string({ maxLength: 8 }));
    await fc.assert(
      fc.asyncProperty(fc.array(param, { maxLength: 4 }), async (pairs) => {
        const res = await call({ handler: scenes.GET, method: 'GET', query: new URLSearchParams(pairs).toString() });
        if (res.status === 200) expect(Array.isArray(res.json.items)).toBe(true);
        else {
          expect(res.status).toBe(400);
          for (const i of res.json.issues ?? []) expect(i.path).toMatch(/^query\.(page|pageSize|q|title|status|training|sort|dir|after|before|other)$/);
        }
      }),
      { numRuns: 200 },
    );
  });
});
