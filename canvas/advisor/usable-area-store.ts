import { create } from 'zustand';
import type { Pt } from '@/lib/scene/geometry/vec';

/** The usable-area drawing in progress (the panel starts it, the plan layer takes the taps). */
export const useUsableAreaDraft = create<{ drawing: boolean; points: Pt[]; set: (s: Partial<{ drawing: boolean; points: Pt[] }>) => void }>((set) => ({
  drawing: false,
  points: [],
  set: (s) => set(s),
}));
