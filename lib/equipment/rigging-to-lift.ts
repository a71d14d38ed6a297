import type { z } from 'zod';
import { parseChain } from '@/lib/lift/ratings/lifting-use';
import type { SlingMaterial } from '@/lib/lift/ratings/hitch';
import { riggingVerdicts, type RiggingVerdict } from '@/lib/lift/rigging';
import { riggingSchema } from '@/lib/lift/rigging-schema';

/**
 * Rigging picked from the inventory into a plan → the engine's rigging input. Each inventory kind goes to
 * its own check: shackles, hooks and snatch blocks are not slings. The pick carries the ratings copied
 * from the inventory; the engine decides from kind, size and grade whether the item is lifting rigging.
 */
export interface RiggingPickLike {
  tag: string;
  kind: string;
  size?: string;
  hitch: 'vertical' | 'choker' | 'basket';
  legs: number;
  angleFromHorizontal: number;
  /** Rated capacity for the chosen hitch as first copied, kg (older plans have only this). */
  ratingKg: number;
  ratings: { vertical: number | null; choker: number | null; basket: number | null } | null;
  chokeAngle?: number | null;
  bendRatio?: number | null;
  lineAngle?: number | null;
}

type RiggingIn = z.input<typeof riggingSchema>;

const MATERIAL: Record<string, SlingMaterial> = {
  'round-sling': 'round-sling',
  'web-sling': 'web-sling',
  'wire-rope-sling': 'wire-rope',
  chain: 'chain',
  'recovery-strap': 'recovery-strap',
};

const opt = <T>(v: T | null | undefined) => (v === null || v === undefined ? undefined : v);

function sling(p: RiggingPickLike): NonNullable<RiggingIn['slings']>[number] {
  const r = p.ratings;
  // Plans saved before per-hitch ratings were copied hold only the chosen hitch's rating.
  const only = (h: RiggingPickLike['hitch']) => (r === null && p.hitch === h ? p.ratingKg : undefined);
  const chain = p.kind === 'chain' ? parseChain(p.size ?? '') : null;
  return {
    id: p.tag,
    name: p.tag,
    material: MATERIAL[p.kind] ?? 'other',
    verticalRating: opt(r?.vertical) ?? p.ratingKg,
    chokerRating: opt(r?.choker) ?? only('choker'),
    basketRating: opt(r?.basket) ?? only('basket'),
    ...(chain ? { grade: opt(chain.grade), size: opt(chain.size) } : {}),
    hitch: p.hitch,
    chokeAngle: p.hitch === 'choker' ? opt(p.chokeAngle) : undefined,
    bendRatio: p.hitch === 'basket' ? opt(p.bendRatio) : undefined,
    angleFromHorizontal: p.angleFromHorizontal,
    legs: p.legs,
  };
}

const wllOf = (p: RiggingPickLike) => opt(p.ratings?.vertical) ?? p.ratingKg;

export function picksToRigging(picks: readonly RiggingPickLike[]): RiggingIn {
  const of = (kind: string) => picks.filter((p) => p.kind === kind);
  const own = new Set(['shackle', 'hook', 'snatch-block']);
  return {
    slings: picks.filter((p) => !own.has(p.kind)).map(sling),
    shackles: of('shackle').map((p) => ({ id: p.tag, name: p.tag, wll: wllOf(p), legs: p.legs, angleFromHorizontal: p.angleFromHorizontal })),
    hooks: of('hook').map((p) => ({ id: p.tag, name: p.tag, wll: wllOf(p), legs: p.legs, angleFromHorizontal: p.angleFromHorizontal })),
    snatchBlocks: of('snatch-block').map((p) => ({ id: p.tag, name: p.tag, wll: wllOf(p), lineAngle: opt(p.lineAngle) })),
  };
}

/** The engine's verdict on one pick alone, for the picker's row (demand against the given load). */
export function pickVerdict(pick: RiggingPickLike, loadMass: number, hookLoad: number): RiggingVerdict | null {
  const parsed = riggingSchema.safeParse(picksToRigging([pick]));
  if (!parsed.success) return null;
  return riggingVerdicts(parsed.data, loadMass, hookLoad)[0] ?? null;
}
