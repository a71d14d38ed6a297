'use client';
import { useState } from 'react';
import type { SceneDocument } from '@/lib/scene/schema';

type SaveState = { kind: 'idle' } | { kind: 'saving' } | { kind: 'saved'; id: number } | { kind: 'error'; message: string };

/** "Save as a training scene": the sandbox's document becomes a new scene in the training set. */
export function useSaveTrainingCopy(sceneId: number, current: () => SceneDocument) {
  const [state, setState] = useState<SaveState>({ kind: 'idle' });
  const save = async (title: string) => {
    setState({ kind: 'saving' });
    const res = await fetch(`/api/scenes/${sceneId}/training-copy`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ title, document: current() }) });
    const body = await res.json().catch(() => ({}));
    setState(res.status === 201 ? { kind: 'saved', id: body.id } : { kind: 'error', message: body.error ?? `Could not save (${res.status})` });
  };
  return { state, save };
}
