import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { JSON_COLUMNS } from '@/db/json-columns';
import { createScene, getScene } from '@/db/repositories/scenes';
import { demoUser, freshSeededDb } from '@/tests/setup/db';

beforeAll(async () => {
  await freshSeededDb();
});

describe('JSON columns', () => {
  it('lists every JSONColumnType column of db/schema.ts', () => {
    const schema = fs.readFileSync(path.join(process.cwd(), 'db/schema.ts'), 'utf8');
    const declared = [...schema.matchAll(/^\s+(\w+): JSONColumnType</gm)].map((m) => m[1]);
    expect(declared.length).toBeGreaterThanOrEqual(3);
    for (const col of declared) expect(JSON_COLUMNS.has(col), `add "${col}" to JSON_COLUMNS in db/json-columns.ts`).toBe(true);
  });

  it('returns text that looks like JSON as the text it was, in titles and inside documents', async () => {
    const op = await demoUser('operator@harrow.example');
    const document = { version: 1, objects: [], notes: '{"crib":"4x4"}', tags: ['[1, 2]', '{}'] };
    const created = await createScene(getDb(), op, { title: '[1, 2]', document });
    const back = (await getScene(getDb(), op, created.id))!;
    expect(back.title).toBe('[1, 2]');
    expect(back.document).toEqual(document);
    expect(typeof (back.document as { notes: unknown }).notes).toBe('string');
  });

  it('still parses the JSON columns themselves into objects', async () => {
    const op = await demoUser('operator@harrow.example');
    const created = await createScene(getDb(), op, { title: 'Parsed document', document: { version: 1, objects: [{ kind: 'tape', length: 12.5 }] } });
    const raw = await getDb().selectFrom('scenes').select(['document', 'title']).where('id', '=', created.id).executeTakeFirstOrThrow();
    expect(raw.document).toEqual({ version: 1, objects: [{ kind: 'tape', length: 12.5 }] });
    const audit = await getDb().selectFrom('audit_log').select('detail').where('scene_id', '=', created.id).executeTakeFirstOrThrow();
    expect(audit.detail).toEqual({ title: 'Parsed document' });
  });
});
