export type { KeyInfo, PointerInfo, ToolState } from '../editor/editor';

/** Pixels a pointer must travel before a press becomes a drag (finger-friendly). */
export const DRAG_THRESHOLD_PX = 5;
