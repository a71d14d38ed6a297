import { describe, expect, it } from 'vitest';
import { buildSceneFile, parseSceneFile, sceneFileName, serializeSceneFile } from '@/canvas/persistence/scene-file';
import { emptySceneDocument, parseSceneDocument } from '@/lib/scene';

const good = () => serializeSceneFile(buildSceneFile('Coil transfer, Route 9 weigh station', emptySceneDocument(), new Date('2026-12-01T21:30:00Z')));

describe('scene file import', () => {
  it('reads back what export wrote', () => {
    const r = parseSceneFile(good(), parseSceneDocument);
    expect(r).toEqual({ ok: true, title: 'Coil transfer, Route 9 weigh station', exportedAt: '2026-12-01T21:30:00.000Z', document: emptySceneDocument() });
    expect(sceneFileName('Coil transfer, Route 9 weigh station')).toBe('coil-transfer-route-9-weigh-station.arcline.json');
  });

  it('brings an older document version up through the editor migrations', () => {
    const file = { ...buildSceneFile('Old export', { version: 1, objects: [] }), exportedAt: '2026-11-01T08:00:00Z' };
    const r = parseSceneFile(JSON.stringify(file), parseSceneDocument);
    expect(r.ok).toBe(true);
    if (r.ok) expect((r.document as { version: number }).version).toBe((emptySceneDocument() as { version: number }).version);
  });

  it('refuses a wrong format tag, reporting only that', () => {
    const file = { ...JSON.parse(good()), format: 'some-other-app', title: 'x' };
    expect(parseSceneFile(JSON.stringify(file), parseSceneDocument)).toEqual({
      ok: false,
      issues: [{ path: 'format', message: 'Expected "arcline-scene": this is not an Arcline scene file' }],
    });
  });

  it('names the bad field inside the document and in the envelope', () => {
    const file = JSON.parse(good());
    file.document.grid = 'wide';
    file.formatVersion = 2;
    const r = parseSceneFile(JSON.stringify(file), parseSceneDocument);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues.map((i) => i.path)).toEqual(['formatVersion']);
    delete file.formatVersion;
    file.formatVersion = 1;
    const r2 = parseSceneFile(JSON.stringify(file), parseSceneDocument);
    expect(r2.ok).toBe(false);
    if (!r2.ok) expect(r2.issues.map((i) => i.path)).toEqual(['document.grid']);
  });

  it('says so when the file is not JSON or the title is too short', () => {
    expect(parseSceneFile('{"format": "arcline-scene",', parseSceneDocument)).toEqual({ ok: false, issues: [{ path: 'file', message: 'The file is not valid JSON' }] });
    const r = parseSceneFile(JSON.stringify({ ...JSON.parse(good()), title: 'ab' }), parseSceneDocument);
    expect(r).toEqual({ ok: false, issues: [{ path: 'title', message: 'Title needs at least 3 characters' }] });
  });
});
