import type { SceneDocument } from '@/lib/scene/schema';
import type { SceneObject } from '@/lib/scene/objects';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';
import type { PlaceKind } from '@/lib/scene/factories';
import type { UnitSystem } from '@/lib/units';
import type { Command } from '../commands/command';
import type { LiveAnalysis } from '../analysis/live-analysis-types';

/** The world point at the centre of the view and the scale. 100 % zoom = BASE_PX_PER_M pixels per metre. */
export interface Camera {
  x: number;
  y: number;
  pxPerM: number;
}

export interface Marquee {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}


export interface EditorState {
  sceneId: number | null;
  document: SceneDocument;
  /** The server revision this document is based on (SAVING keeps it current). */
  revision: number;
  readOnly: boolean;
  units: UnitSystem;
  profiles: TruckProfileInput[];
  /** Model of the document truck's profile version; null with no truck. */
  truck: TruckModel | null;
  selection: string[];
  /** Current tool state, e.g. "select.idle", "select.dragging", "place.idle". */
  toolPath: string;
  placeKind: PlaceKind | null;
  /** Points of a polygon being drawn (place.polygon). */
  draft: { x: number; y: number }[];
  marquee: Marquee | null;
  camera: Camera;
  viewport: { width: number; height: number };
  snapToGrid: boolean;
  /** Angle step for rotating, degrees; 0 turns angle snapping off. */
  angleStep: number;
  clipboard: SceneObject[];
  undoStack: SceneDocument[];
  redoStack: SceneDocument[];
  /** The document as it was when the gesture in progress began. */
  gestureBase: SceneDocument | null;
  helpOpen: boolean;
  /** Read-only viewers scrub the slew here instead of in the document. */
  scrubSlew: number | null;
  /** The engine's live view of the scene (canvas/analysis). */
  analysis: LiveAnalysis | null;

  run(command: Command): void;
  cancelGesture(): void;
  undo(): void;
  redo(): void;
  /** SAVING's entry point: a document from the server or a draft replaces ours, outside the undo history. */
  replaceDocument(doc: SceneDocument, opts: { revision: number; keepHistory?: boolean }): void;
  setRevision(revision: number): void;
  set(patch: Partial<Omit<EditorState, 'run' | 'undo' | 'redo' | 'replaceDocument' | 'setRevision' | 'set' | 'cancelGesture'>>): void;
}
