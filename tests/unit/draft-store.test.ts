import { describe, expect, it } from 'vitest';
import { draftKey, memoryDraftStore } from '@/canvas/persistence/draft-store';

describe('draft store', () => {
  it('keys drafts by scene id and base revision, keeping one per scene', async () => {
    expect(draftKey(12, 7)).toBe('scene:12:rev:7');
    const store = memoryDraftStore();
    await store.put({ sceneId: 12, baseRevision: 7, document: { grid: 1 }, savedAt: 100 });
    await store.put({ sceneId: 12, baseRevision: 8, document: { grid: 2 }, savedAt: 200 });
    await store.put({ sceneId: 1, baseRevision: 8, document: { grid: 3 }, savedAt: 300 });
    expect(store.size()).toBe(2);
    expect(await store.latest(12)).toEqual({ sceneId: 12, baseRevision: 8, document: { grid: 2 }, savedAt: 200 });
    await store.clear(12);
    expect(await store.latest(12)).toBeUndefined();
    // Scene 1 must not be touched by clearing scene 12 (no prefix collision "scene:1" / "scene:12").
    expect((await store.latest(1))?.document).toEqual({ grid: 3 });
  });
});
