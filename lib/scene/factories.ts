import type { SceneObject, TruckObject } from './objects';
import type { TruckModel } from './truck/truck-model';
import { maxExtension } from './truck/truck-model';
import { ftToM, lbToKg, type UnitSystem } from '@/lib/units';

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

/**
 * A default figure, round in the placing user's units: feet or pounds for imperial (converted exactly),
 * metres or kilograms for metric. Plausible roadside sizes (common practice, no published source).
 */
const ft = (units: UnitSystem, feet: number, metres: number) => (units === 'metric' ? metres : ftToM(feet));
const lb = (units: UnitSystem, pounds: number, kg: number) => (units === 'metric' ? kg : lbToKg(pounds));

/** Default objects the place tool puts down, all editable afterwards. */
export function newObject(kind: PlaceKind, id: string, at: { x: number; y: number }, truck: { profileId: number; profileVersion: number; model: TruckModel | null } | null, units: UnitSystem = 'imperial'): SceneObject | null {
  const base = { id, x: at.x, y: at.y, rotation: 0, locked: false, label: '' };
  const block = lb(units, 200, 90);
  switch (kind) {
    case 'truck': {
      if (!truck) return null;
      const legs: TruckObject['legs'] = {};
      for (const leg of truck.model?.legs ?? []) legs[leg.id] = { extension: maxExtension(leg), cribbing: null };
      const b = truck.model?.boom;
      return {
        ...base,
        kind: 'truck',
        profileId: truck.profileId,
        profileVersion: truck.profileVersion,
        legs,
        boom: { slew: 90, elevation: 30, length: b ? Math.round(((b.minLength + b.maxLength) / 2) * 10) / 10 : 10 },
      };
    }
    case 'load-coil':
      return { ...base, kind: 'load', shape: { kind: 'coil', eye: 'horizontal', outerDiameter: ft(units, 6, 1.8), innerDiameter: ft(units, 2, 0.6), width: ft(units, 5, 1.5) }, massMode: 'estimate', massKg: 0, density: 7850, weightUncertainty: 5, cg: { x: 0, y: 0, z: ft(units, 3, 0.9) }, hang: ft(units, 10, 3), blockMassKg: block, rigging: [] };
    case 'load-box':
      return { ...base, kind: 'load', shape: { kind: 'box', length: ft(units, 8, 2.4), width: ft(units, 4, 1.2), height: ft(units, 4, 1.2) }, massMode: 'given', massKg: lb(units, 4400, 2000), density: 600, weightUncertainty: 10, cg: { x: 0, y: 0, z: ft(units, 2, 0.6) }, hang: ft(units, 10, 3), blockMassKg: block, rigging: [] };
    case 'load-vehicle':
      return { ...base, kind: 'load', shape: { kind: 'vehicle', length: ft(units, 25, 7.5), width: ft(units, 8, 2.4), height: ft(units, 10.5, 3.2) }, massMode: 'given', massKg: lb(units, 16500, 7500), density: 300, weightUncertainty: 10, cg: { x: ft(units, 1.5, 0.4), y: 0, z: ft(units, 3.5, 1.1) }, hang: ft(units, 11.5, 3.5), blockMassKg: block, rigging: [] };
    case 'trailer':
      return { ...base, kind: 'trailer', length: ft(units, 48, 14.6), width: ft(units, 8.5, 2.6), deckHeight: ft(units, 5, 1.5) };
    case 'obstacle-rect':
      return { ...base, kind: 'obstacle', obstacleKind: 'structure', shape: { kind: 'rect', length: 4, width: 3 }, height: 3, voltageKV: null };
    case 'obstacle-circle':
      return { ...base, kind: 'obstacle', obstacleKind: 'structure', shape: { kind: 'circle', diameter: 2 }, height: 2, voltageKV: null };
    case 'obstacle-polygon':
      return null;
    case 'pole':
      return { ...base, kind: 'obstacle', obstacleKind: 'pole', shape: { kind: 'circle', diameter: 0.35 }, height: 10, voltageKV: null };
    case 'tree':
      return { ...base, kind: 'obstacle', obstacleKind: 'tree', shape: { kind: 'circle', diameter: 5 }, height: 9, voltageKV: null };
    case 'traffic-lane':
      return { ...base, kind: 'obstacle', obstacleKind: 'traffic-lane', shape: { kind: 'rect', length: 30, width: 3.6 }, height: 4.3, voltageKV: null };
    case 'power-line':
      return { ...base, kind: 'obstacle', obstacleKind: 'power-line', shape: { kind: 'line', length: 40 }, height: 9, voltageKV: 13.8 };
    case 'note':
      return { ...base, kind: 'note', text: 'Note' };
  }
}
