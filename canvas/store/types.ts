import type { SceneDocument } from '../document/schema';
import type { SceneObject } from '../document/objects';
import type { TruckModel } from '../truck/truck-model';
import type { TruckProfileInput } from '../truck/from-spec';
import type { UnitSystem } from '@/lib/units';
import type { Command } from '../commands/command';
import type { LiveAnalysis } from '../analysis/live-analysis';

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

/** What the place tool puts down next. */
export type PlaceKind =
  | 'truck'
  | 'load-coil'
  | 'load-box'
  | 'load-vehicle'
  | 'trailer'
  | 'obstacle-rect'
  | 'obstacle-circle'
  | 'obstacle-polygon'
  | 'pole'
  | 'tree'
  | 'traffic-lane'
  | 'power-line'
  | 'note';

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
