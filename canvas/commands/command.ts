import type { SceneDocument } from '@/lib/scene/schema';

/**
 * An edit is a command: it takes the document and returns the next one, saying how the change meets the
 * undo stack. 'commit' ends a change (one undo step, from the start of any gesture in progress);
 * 'gesture' is a live frame of a drag that is not yet a step; 'none' never enters the history.
 */
export type Capture = 'commit' | 'gesture' | 'none';

export interface CommandResult {
  document: SceneDocument;
  capture: Capture;
}

export type Command = (doc: SceneDocument) => CommandResult;

export const commit = (document: SceneDocument): CommandResult => ({ document, capture: 'commit' });
export const gesture = (document: SceneDocument): CommandResult => ({ document, capture: 'gesture' });
