import type { SceneStatus } from '@/lib/domain';
import { sceneDocumentSchema, type SceneDocumentIn } from '@/lib/scene/schema';
import { coilTransfer, reefer } from './demo-scenes';

/**
 * The review desk's demo plans (issue 13), all invented, drawn by a second Harrow Ridge operator: one
 * awaiting review with a pinned comment, one returned with a note, and one beyond a hard limit (its pad
 * presses past the ground's allowable and the lift is past the load chart), so the refusal can be seen.
 * Their records (submissions, comments, decisions) are written by ./demo-review.
 */
const withLoad = (d: SceneDocumentIn, patch: Record<string, unknown>): SceneDocumentIn => ({
  ...d,
  objects: d.objects.map((o) => (o.kind === 'load' ? ({ ...o, ...patch } as typeof o) : o)),
});

export const REVIEW_TITLES = {
  awaiting: 'Pipe bundle onto the low-loader, Station Road yard',
  returned: 'Tipped grain trailer, Kestrel Lane',
  beyond: 'Loaded livestock trailer on its side, Pell Lane',
} as const;

export const REVIEW_SCENES: { org: 'harrow-ridge'; owner: string; title: string; status: SceneStatus; truck: string; inTrainingSet?: boolean; history?: Record<string, unknown>[]; document: Record<string, unknown> }[] = [
  {
    org: 'harrow-ridge', owner: 'operator2@harrow.example', title: REVIEW_TITLES.awaiting, status: 'submitted', truck: 'HR-7',
    document: sceneDocumentSchema.parse(withLoad(coilTransfer, { shape: { kind: 'coil', eye: 'horizontal', outerDiameter: 1.4, innerDiameter: 0.6, width: 1.2 }, label: 'Pipe bundle (estimated)' })),
  },
  {
    org: 'harrow-ridge', owner: 'operator2@harrow.example', title: REVIEW_TITLES.returned, status: 'returned', truck: 'HR-7',
    document: sceneDocumentSchema.parse(withLoad(reefer, { massKg: 9000, label: 'Grain trailer on its side (front half)' })),
  },
  {
    org: 'harrow-ridge', owner: 'operator2@harrow.example', title: REVIEW_TITLES.beyond, status: 'submitted', truck: 'HR-7',
    document: sceneDocumentSchema.parse(withLoad(reefer, { massKg: 12000, label: 'Livestock trailer on its side (loaded)' })),
  },
];
