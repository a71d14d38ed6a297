import type { SceneStatus } from '@/lib/domain';
import { sceneDocumentSchema, type SceneDocumentIn } from '@/lib/scene/schema';
import { standardRating } from '@/lib/equipment/rigging-ratings';
import { SOIL_CHOICES } from '@/lib/lift/soil';

/**
 * Invented demo scenes, sketched in full: every place, person and number is made up for the demo.
 * Site frame: metres, x east, y north; the truck's slew axis at the origin. The truck's profile id is
 * filled in at seed time (withTruckProfile), since ids are only known then.
 */
const soil = (id: (typeof SOIL_CHOICES)[number]['id']) => ({ preset: id, allowable: SOIL_CHOICES.find((s) => s.id === id)!.kPa });
const mat = { area: 1.44, mass: 60, label: '4 ft × 4 ft mat (example)' };
const roundSling = (tag: string, colour: string, legs: number, angle: number) => {
  const r = standardRating('round-sling', colour)!;
  return { itemId: null, tag, kind: 'round-sling', hitch: 'basket' as const, legs, angleFromHorizontal: angle, ratingKg: r.basket!, ratings: { vertical: r.vertical, choker: r.choker, basket: r.basket }, massKg: 8 };
};
const base = { rotation: 0, locked: false, label: '' };

export const coilTransfer: SceneDocumentIn = {
  version: 3,
  objects: [
    { ...base, id: 'lane', kind: 'obstacle', obstacleKind: 'traffic-lane', x: 0, y: 15, shape: { kind: 'rect', length: 70, width: 3.7 }, height: 4.3, label: 'Route 9 westbound lane' },
    { ...base, id: 'trailer-a', kind: 'trailer', x: -2.5, y: -6.2, length: 14.6, width: 2.6, deckHeight: 1.5, label: 'Disabled flatbed (coil on it)' },
    { ...base, id: 'trailer-b', kind: 'trailer', x: -2.5, y: 6.2, length: 14.6, width: 2.6, deckHeight: 1.5, label: 'Receiving flatbed' },
    { ...base, id: 'scale-house', kind: 'obstacle', obstacleKind: 'structure', x: 11, y: -9.5, shape: { kind: 'rect', length: 6, width: 4 }, height: 3.5, label: 'Scale house' },
    { ...base, id: 'light-pole', kind: 'obstacle', obstacleKind: 'pole', x: -10.5, y: 1.5, shape: { kind: 'circle', diameter: 0.3 }, height: 9, label: 'Light pole' },
    { ...base, id: 'feeder', kind: 'obstacle', obstacleKind: 'power-line', x: 0, y: -17, shape: { kind: 'line', length: 60 }, height: 10, voltageKV: 13.8, label: 'Feeder 13.8 kV' },
    {
      ...base,
      id: 'truck',
      kind: 'truck',
      x: 0,
      y: 0,
      profileId: 1,
      profileVersion: 1,
      legs: { FL: { extension: 2.2, cribbing: mat }, FR: { extension: 2.2, cribbing: mat }, RL: { extension: 2.2, cribbing: mat }, RR: { extension: 2.2, cribbing: mat }, FJ: { extension: 0.55, cribbing: null } },
      boom: { slew: 260, elevation: 49, length: 10.4 },
      label: '',
    },
    {
      ...base,
      id: 'coil',
      kind: 'load',
      x: -1.03,
      y: -5.83,
      shape: { kind: 'coil', eye: 'horizontal', outerDiameter: 1.6, innerDiameter: 0.6, width: 0.9 },
      massMode: 'estimate',
      massKg: 0,
      density: 7850,
      weightUncertainty: 5,
      cg: { x: 0, y: 0, z: 0.8 },
      hang: 3,
      blockMassKg: 120,
      rigging: [roundSling('HR-RS-06', 'blue', 2, 60)],
      label: 'Steel coil',
    },
    { ...base, id: 'note-1', kind: 'note', x: 4, y: -2, text: 'Flagger at the scale exit.\nCones on the lane line.' },
    { ...base, id: 'tape-1', kind: 'tape', x: -2.5, y: -4.9, x2: -2.5, y2: 4.9 },
  ],
  swing: { from: 260, to: 100, direction: 'cw' },
  soil: soil('sandy-gravel'),
  limits: { percentOfTipping: 85, clearance: 0.3, percentOfRated: 100 },
};

export const reefer: SceneDocumentIn = {
  version: 3,
  objects: [
    { ...base, id: 'ramp-lane', kind: 'obstacle', obstacleKind: 'traffic-lane', x: 4, y: 9, rotation: 20, shape: { kind: 'rect', length: 60, width: 3.7 }, height: 4.3, label: 'On-ramp lane (closed)' },
    { ...base, id: 'guardrail', kind: 'obstacle', obstacleKind: 'structure', x: -6, y: -3, rotation: 20, shape: { kind: 'rect', length: 30, width: 0.4 }, height: 0.8, label: 'Guardrail' },
    { ...base, id: 'tree-1', kind: 'obstacle', obstacleKind: 'tree', x: -14, y: -12, shape: { kind: 'circle', diameter: 6 }, height: 11, label: 'Oak' },
    { ...base, id: 'sign', kind: 'obstacle', obstacleKind: 'pole', x: 9, y: -7, shape: { kind: 'circle', diameter: 0.25 }, height: 5, label: 'Exit sign post' },
    { ...base, id: 'distribution', kind: 'obstacle', obstacleKind: 'power-line', x: 0, y: 22, rotation: 20, shape: { kind: 'line', length: 70 }, height: 11, voltageKV: 34.5, label: 'Distribution 34.5 kV' },
    {
      ...base,
      id: 'truck',
      kind: 'truck',
      x: 0,
      y: 0,
      rotation: 20,
      profileId: 1,
      profileVersion: 1,
      legs: { FL: { extension: 2.2, cribbing: mat }, FR: { extension: 1.1, cribbing: mat }, RL: { extension: 2.2, cribbing: mat }, RR: { extension: 1.1, cribbing: mat }, FJ: { extension: 0.55, cribbing: null } },
      boom: { slew: 200, elevation: 35, length: 10.4 },
      label: '',
    },
    {
      ...base,
      id: 'reefer',
      kind: 'load',
      x: -7.7,
      y: -3.9,
      rotation: 20,
      shape: { kind: 'vehicle', length: 8, width: 2.6, height: 2.7 },
      massMode: 'given',
      massKg: 6800,
      density: 300,
      weightUncertainty: 15,
      cg: { x: 0.3, y: 0, z: 1.1 },
      hang: 3.5,
      blockMassKg: 120,
      rigging: [roundSling('HR-RS-04', 'red', 2, 55)],
      label: 'Reefer trailer on its side (front half)',
    },
    { ...base, id: 'note-1', kind: 'note', x: 6, y: -12, text: 'Right legs short: ramp shoulder.\nSecond truck holds the tail.' },
  ],
  swing: { from: 200, to: 160, direction: 'cw' },
  soil: soil('sandy-gravel'),
  limits: { percentOfTipping: 80, clearance: 0.3, percentOfRated: 100 },
};

const embankment: SceneDocumentIn = {
  version: 3,
  objects: [
    { ...base, id: 'road', kind: 'obstacle', obstacleKind: 'traffic-lane', x: 0, y: 6, shape: { kind: 'rect', length: 60, width: 3.6 }, height: 4.3, label: 'Quarry Road eastbound' },
    { ...base, id: 'culvert', kind: 'obstacle', obstacleKind: 'structure', x: 7, y: -9, rotation: -10, shape: { kind: 'polygon', points: [{ x: -2, y: -1.5 }, { x: 2.5, y: -1.2 }, { x: 2, y: 1.6 }, { x: -2.2, y: 1.2 }] }, height: 1.2, label: 'Culvert headwall' },
    { ...base, id: 'pole-1', kind: 'obstacle', obstacleKind: 'pole', x: -12, y: -2.5, shape: { kind: 'circle', diameter: 0.35 }, height: 11, label: 'Utility pole 14' },
    { ...base, id: 'service', kind: 'obstacle', obstacleKind: 'power-line', x: -12, y: 5, rotation: 90, shape: { kind: 'line', length: 15 }, height: 7, voltageKV: null, label: 'Service drop (voltage unknown)' },
    {
      ...base,
      id: 'truck',
      kind: 'truck',
      x: 0,
      y: 0,
      profileId: 1,
      profileVersion: 1,
      legs: { FL: { extension: 2.0, cribbing: mat }, FR: { extension: 2.0, cribbing: mat }, RL: { extension: 2.0, cribbing: mat }, RR: { extension: 2.0, cribbing: mat }, FJ: { extension: 0.55, cribbing: null } },
      boom: { slew: 250, elevation: 20, length: 11 },
      label: '',
    },
    {
      ...base,
      id: 'box-truck',
      kind: 'load',
      x: -4.4,
      y: -9.4,
      rotation: 70,
      shape: { kind: 'vehicle', length: 7.3, width: 2.4, height: 3.3 },
      massMode: 'given',
      massKg: 5400,
      density: 300,
      weightUncertainty: 10,
      cg: { x: 0.5, y: 0, z: 1.2 },
      hang: 4,
      blockMassKg: 120,
      rigging: [],
      label: 'Box truck down the bank',
    },
    { ...base, id: 'note-1', kind: 'note', x: 3, y: -4, text: 'Bank drops about 3 m (10 ft).\nSoft ground at the toe.' },
  ],
  swing: { from: 250, to: 200, direction: 'cw' },
  soil: soil('clay'),
  limits: { percentOfTipping: 85, clearance: 0.3, percentOfRated: 100 },
};

/**
 * How the reefer plan got to its approved form, for the replay's timeline: revision 1 had the right-hand
 * outriggers only part out (0.6 m) and a purple sling pair at 45°; revision 2 moved them out to 1.1 m;
 * revision 3 (the approved plan) re-rigged the load on the red sling pair at 55°.
 */
function reeferHistory(): Record<string, unknown>[] {
  const withLegs = (doc: SceneDocumentIn, right: number): SceneDocumentIn => ({
    ...doc,
    objects: doc.objects.map((o) => (o.kind === 'truck' ? { ...o, legs: { ...o.legs, FR: { ...o.legs!.FR, extension: right }, RR: { ...o.legs!.RR, extension: right } } } : o)),
  });
  const rigged = (doc: SceneDocumentIn): SceneDocumentIn => ({
    ...doc,
    objects: doc.objects.map((o) => (o.kind === 'load' ? { ...o, rigging: [roundSling('HR-RS-01', 'purple', 2, 45)] } : o)),
  });
  return [sceneDocumentSchema.parse(rigged(withLegs(reefer, 0.6))), sceneDocumentSchema.parse(rigged(reefer))];
}

/** Puts the seeded profile's id and version on the document's truck. */
export function withTruckProfile(document: Record<string, unknown>, truck: { id: number; version: number } | undefined): Record<string, unknown> {
  if (!truck || !Array.isArray(document.objects)) return document;
  return { ...document, objects: document.objects.map((o: Record<string, unknown>) => (o.kind === 'truck' ? { ...o, profileId: truck.id, profileVersion: truck.version } : o)) };
}

export const DEMO_SCENES: {
  org: 'harrow-ridge' | 'cobalt-flats';
  owner: string;
  title: string;
  status: SceneStatus;
  truck?: string;
  inTrainingSet?: boolean;
  /** Earlier saves, oldest first; `document` is the latest revision. */
  history?: Record<string, unknown>[];
  document: Record<string, unknown>;
}[] = [
  { org: 'harrow-ridge', owner: 'operator@harrow.example', title: 'Coil transfer, Route 9 weigh station', status: 'draft', truck: 'HR-7', document: sceneDocumentSchema.parse(coilTransfer) },
  { org: 'harrow-ridge', owner: 'operator@harrow.example', title: 'Overturned reefer trailer, Mill Creek on-ramp', status: 'approved', truck: 'HR-7', inTrainingSet: true, history: reeferHistory(), document: sceneDocumentSchema.parse(reefer) },
  { org: 'cobalt-flats', owner: 'operator@cobalt.example', title: 'Box truck up the embankment, Quarry Road', status: 'draft', truck: 'CF-2', document: sceneDocumentSchema.parse(embankment) },
];
