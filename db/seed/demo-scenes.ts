import type { SceneStatus } from '../schema';
import { emptySceneDocument } from '@/lib/scene-document';

/** Invented demo scenes; the editor replaces these documents with full sketches. */
export const DEMO_SCENES: {
  org: 'harrow-ridge' | 'cobalt-flats';
  owner: string;
  title: string;
  status: SceneStatus;
  truck?: string;
  inTrainingSet?: boolean;
  document: Record<string, unknown>;
}[] = [
  { org: 'harrow-ridge', owner: 'operator@harrow.example', title: 'Coil transfer, Route 9 weigh station', status: 'draft', truck: 'HR-7', document: emptySceneDocument() },
  { org: 'harrow-ridge', owner: 'operator@harrow.example', title: 'Overturned reefer trailer, Mill Creek on-ramp', status: 'approved', truck: 'HR-7', inTrainingSet: true, document: emptySceneDocument() },
  { org: 'cobalt-flats', owner: 'operator@cobalt.example', title: 'Box truck up the embankment, Quarry Road', status: 'draft', truck: 'CF-2', document: emptySceneDocument() },
];
