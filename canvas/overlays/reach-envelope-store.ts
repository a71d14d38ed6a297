'use client';
import { useSyncExternalStore } from 'react';
import type { EnvelopeGrid } from '@/lib/envelope';
import type { EnvelopePicture } from './envelope-picture';

/**
 * Whether the reach envelope is shown, and the last one computed. Module state rather than the editor
 * store: the toggle (a DOM button) and the overlay (inside the Konva tree) share it, and nothing of it is
 * saved with the scene.
 */
export interface EnvelopeState {
  on: boolean;
  grid: EnvelopeGrid | null;
  /** Names of what the load meets inside the limits. */
  cutBy: string[];
  /** The envelope painted for the part of the plan in view (null: none of it in view, or not painted yet). */
  picture: EnvelopePicture | null;
  /** Time the last grid took, ms, and where it ran. */
  ms: number | null;
  where: 'worker' | 'main' | null;
  busy: boolean;
}

let state: EnvelopeState = { on: false, grid: null, cutBy: [], picture: null, ms: null, where: null, busy: false };
const listeners = new Set<() => void>();

export const envelopeStore = {
  get: () => state,
  set(patch: Partial<EnvelopeState>) {
    state = { ...state, ...patch };
    listeners.forEach((l) => l());
  },
  subscribe(l: () => void) {
    listeners.add(l);
    return () => listeners.delete(l);
  },
};

export function useEnvelopeState<T>(pick: (s: EnvelopeState) => T): T {
  return useSyncExternalStore(envelopeStore.subscribe, () => pick(envelopeStore.get()), () => pick(envelopeStore.get()));
}
