import { describe, expect, it } from 'vitest';
import { CURRENT_VERSION, sceneDocumentSchema } from '@/lib/scene/schema';
import { emptySceneDocument } from '@/lib/scene/empty';
import { migrateDocument, parseSceneDocument } from '@/lib/scene';
import { updateSceneSchema } from '@/lib/validations/scenes';
import { emptySceneDocument as serverEmpty } from '@/lib/scene';
import { TestEditor } from './test-editor';

function sketched() {
  const t = new TestEditor();
  t.tool('truck').click(0, 0).tool('load-coil').click(0, 9).tool('trailer').click(-12, 6).tool('power-line').click(5, 25);
  t.tool('obstacle-polygon').click(10, -10).click(16, -10).click(13, -5).keyDown('Enter');
  t.tool('note').click(-5, -8).tool('tape').drag([0, -12], [9, -12]);
  return t;
}

describe('scene document', () => {
  it('a sketched document survives JSON and the schema unchanged', () => {
    const doc = sketched().doc;
    expect(doc.objects.map((o) => o.kind).sort()).toEqual(['load', 'note', 'obstacle', 'obstacle', 'tape', 'trailer', 'truck']);
    const back = sceneDocumentSchema.parse(JSON.parse(JSON.stringify(doc)));
    expect(back).toEqual(doc);
  });

  it('the server and the editor share one blank document', () => {
    expect(serverEmpty()).toEqual(emptySceneDocument());
    expect(emptySceneDocument().version).toBe(CURRENT_VERSION);
  });

  it('migrates the foundation’s version-1 placeholder up to the current version', () => {
    const v1 = { version: 1, objects: [] };
    const up = migrateDocument(v1) as Record<string, unknown>;
    expect(up.version).toBe(CURRENT_VERSION);
    const parsed = parseSceneDocument(v1);
    // A version-1 document keeps the ground figure it was made with (144 kPa); new blank scenes start at 3,000 psf.
    expect(parsed.ok && parsed.document).toEqual({ ...emptySceneDocument(), soil: { preset: 'custom', allowable: 144 } });
  });

  it('migrates a version-2 document to version 3 with no usable area marked', () => {
    const up = migrateDocument({ version: 2, objects: [], swing: { from: 10, to: 80, direction: 'cw' } }) as Record<string, unknown>;
    expect(up).toMatchObject({ version: 3, usableArea: null, swing: { from: 10, to: 80, direction: 'cw' } });
    const parsed = parseSceneDocument({ version: 2, objects: [] });
    expect(parsed.ok && parsed.document.usableArea).toBeNull();
  });

  it('keeps a marked usable area and refuses one with fewer than three corners', () => {
    const area = [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 6 }];
    const ok = parseSceneDocument({ version: 3, objects: [], usableArea: area });
    expect(ok.ok && ok.document.usableArea).toEqual(area);
    const bad = parseSceneDocument({ version: 3, objects: [], usableArea: area.slice(0, 2) });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues[0].path).toBe('usableArea');
  });

  it('a version-1 document with objects keeps them through the migration', () => {
    const note = { id: 'n1', kind: 'note', x: 1, y: 2, text: 'Flagger here' };
    const parsed = parseSceneDocument({ version: 1, objects: [note] });
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(parsed.document.objects[0]).toMatchObject({ ...note, rotation: 0, locked: false });
  });

  it('refuses a document from a newer version with a plain message', () => {
    const parsed = parseSceneDocument({ version: CURRENT_VERSION + 1, objects: [] });
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.issues[0].message).toMatch(/newer Arcline/);
  });

  it('the scene route schema names the bad field inside the document', () => {
    const doc = sketched().doc;
    const objects = structuredClone(doc.objects) as unknown as Record<string, unknown>[];
    const i = objects.findIndex((o) => o.kind === 'obstacle');
    objects[i].height = -1;
    const r = updateSceneSchema.safeParse({ revision: 3, document: { ...doc, objects } });
    expect(r.success).toBe(false);
    if (!r.success) expect(r.error.issues.map((x) => x.path.join('.'))).toContain(`document.objects.${i}.height`);
  });

  it('a power line must be a line, and two trucks are refused', () => {
    const doc = sketched().doc;
    const wire = doc.objects.find((o) => o.kind === 'obstacle' && o.obstacleKind === 'power-line')!;
    const bad = { ...doc, objects: doc.objects.map((o) => (o.id === wire.id ? { ...o, shape: { kind: 'rect', length: 3, width: 1 } } : o)) };
    const r = sceneDocumentSchema.safeParse(bad);
    expect(r.success).toBe(false);
    const truck = doc.objects.find((o) => o.kind === 'truck')!;
    const two = sceneDocumentSchema.safeParse({ ...doc, objects: [...doc.objects, { ...truck, id: 'truck-2' }] });
    expect(two.success).toBe(false);
    if (!two.success) expect(two.error.issues[0].message).toBe('A scene has at most one truck');
  });
});
