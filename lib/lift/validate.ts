import { LiftError } from './errors';
import { signedArea2, toFlat } from './geometry';
import { liftInputSchema, type LiftInput, type LiftInputIn, type PowerLine, type Prism } from './schema';
import { siteToTruck, type SitePose } from './types';

/**
 * Input validation at the engine's edge: zod for shapes and types, then the engine's own checks that
 * give typed errors (polygons with no area), and site-frame objects turned into the truck frame.
 */
/** Inputs this module has validated itself, so the editor's repeated analyses skip re-parsing. */
const validated = new WeakSet<object>();

/** Marks an input parsed elsewhere in this library (incremental-parse.ts) so prepareLift does not parse it again. */
export function markValidated(input: LiftInput): void {
  validated.add(input);
}

/** zod-validates an input (defaults filled in); failures become LiftError naming the field. */
export function parseLiftInput(raw: LiftInputIn | LiftInput): LiftInput {
  if (typeof raw === 'object' && raw !== null && validated.has(raw)) return raw as LiftInput;
  const parsed = liftInputSchema.safeParse(raw);
  if (parsed.success) {
    validated.add(parsed.data);
    return parsed.data;
  }
  const issue = parsed.error.issues[0];
  const field = issue.path.map(String).join('.') || 'input';
  const last = String(issue.path[issue.path.length - 1] ?? '');
  const code = /mass$/i.test(last) ? 'invalid-mass' : 'invalid-input';
  throw new LiftError(code, `${fieldWords(issue.path)}: ${issue.message}`, field);
}

/** One item of each list in the input, as a person names it. */
const ITEM: Record<string, string> = {
  supports: 'support',
  masses: 'mass',
  obstacles: 'obstacle',
  powerLines: 'power line',
  bodies: 'truck part',
  polygon: 'outline point',
  points: 'point',
  radii: 'radius',
  boomLengths: 'boom length',
  rated: 'rating row',
  snatchBlocks: 'snatch block',
  hooks: 'hook',
  slings: 'sling',
  shackles: 'shackle',
};

/**
 * A zod path in words for the message (the machine-readable path stays in `field`):
 * ['supports', 2, 'cribbingMass'] reads "Support 3 cribbing mass", counted from 1 as people count.
 */
export function fieldWords(path: readonly PropertyKey[]): string {
  const words: string[] = [];
  for (let i = 0; i < path.length; i++) {
    const key = path[i];
    const next = path[i + 1];
    if (typeof key === 'number') words.push(String(key + 1));
    else if (typeof next === 'number') {
      words.push(`${ITEM[String(key)] ?? camelWords(String(key))} ${next + 1}`);
      i++;
    } else words.push(camelWords(String(key)));
  }
  const text = words.join(' ') || 'input';
  return text[0]!.toUpperCase() + text.slice(1);
}

/** Field names that camel-case splitting would garble. */
const WORD: Record<string, string> = { kV: 'voltage', wll: 'working load limit', cgFraction: 'centre of gravity position', z: 'height' };
const camelWords = (key: string) => WORD[key] ?? key.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();

/**
 * A parsed input with some of its parts swapped for other parsed values (a search that moves the truck
 * thousands of times): skips re-parsing. The caller vouches that every swapped value passed the schema.
 */
export function withParsedParts(input: LiftInput, parts: Partial<LiftInput>): LiftInput {
  const next = { ...input, ...parts };
  validated.add(next);
  return next;
}

/** How many distinct points, up to 3 (all a polygon needs); no strings, as a search checks thousands. */
function distinctPoints(points: readonly { x: number; y: number }[]): number {
  const seen: { x: number; y: number }[] = [];
  for (const p of points) {
    if (!seen.some((q) => q.x === p.x && q.y === p.y)) seen.push(p);
    if (seen.length >= 3) break;
  }
  return seen.length;
}

export function checkPolygon(points: readonly { x: number; y: number }[], field: string, what: string): Float64Array {
  const flat = toFlat(points);
  if (distinctPoints(points) < 3 || Math.abs(signedArea2(flat, points.length)) < 1e-9) {
    throw new LiftError('degenerate-polygon', `${what} has no area: its outline needs three or more points not on one line.`, field);
  }
  return flat;
}

export function siteObjects(input: LiftInput): { obstacles: Prism[]; powerLines: PowerLine[] } {
  const site = input.site;
  if (!site) return { obstacles: [], powerLines: [] };
  const pose: SitePose = { x: site.x, y: site.y, heading: site.heading };
  return {
    obstacles: site.obstacles.map((o) => ({ ...o, polygon: o.polygon.map((p) => siteToTruck(p, pose)) })),
    powerLines: site.powerLines.map((l) => ({
      ...l,
      a: { ...siteToTruck(l.a, pose), z: l.a.z },
      b: { ...siteToTruck(l.b, pose), z: l.b.z },
    })),
  };
}

