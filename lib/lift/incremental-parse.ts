import { z } from 'zod';
import { liftInputSchema, type LiftInput, type LiftInputIn } from './schema';
import { markValidated, parseLiftInput } from './validate';

/**
 * Validation of only what changed (issue 10 item 5). The editor re-derives the engine input on every drag
 * frame; a full zod parse of it (load chart, every obstacle) would run each frame. This walks the schema
 * beside the previous frame's input: parts equal to last time keep last time's parsed value, and only the
 * parts that differ are parsed, down to the array element or object field that changed. The result is
 * the same object a full parse gives (a property test checks it); on any failure the full parse runs, so
 * errors name the same field as before.
 */
export interface ParseMemo {
  raw: unknown;
  parsed: LiftInput;
}

export interface IncrementalParse {
  input: LiftInput;
  memo: ParseMemo;
  /** Paths that were parsed this time ("" = the whole input); the bench and the tests read it. */
  parsed: string[];
}

/** Structural equality of plain data (what the scene → lift translation produces). */
export function sameData(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return Number.isNaN(a) && Number.isNaN(b);
  if (Array.isArray(a)) {
    if (!Array.isArray(b) || a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!sameData(a[i], b[i])) return false;
    return true;
  }
  if (Array.isArray(b)) return false;
  const ka = Object.keys(a);
  if (ka.length !== Object.keys(b).length) return false;
  for (const k of ka) if (!sameData((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k])) return false;
  return true;
}

class PartFailed extends Error {}

const hasChecks = (s: z.ZodType) => ((s._zod.def as { checks?: unknown[] }).checks?.length ?? 0) > 0;
const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

function parsePart(schema: z.ZodType, raw: unknown, prevRaw: unknown, prev: unknown, path: string, log: string[]): unknown {
  if (sameData(raw, prevRaw)) return prev;
  const whole = () => {
    log.push(path);
    const r = schema.safeParse(raw);
    if (!r.success) throw new PartFailed();
    return r.data;
  };
  // Defaults and optionals only act on `undefined`; anything else is the inner schema's.
  if (schema instanceof z.ZodDefault || schema instanceof z.ZodPrefault || schema instanceof z.ZodOptional) {
    if (raw === undefined || prevRaw === undefined || hasChecks(schema)) return whole();
    return parsePart(schema.unwrap() as z.ZodType, raw, prevRaw, prev, path, log);
  }
  if (schema instanceof z.ZodObject && !hasChecks(schema) && isPlainObject(raw) && isPlainObject(prevRaw) && isPlainObject(prev)) {
    const shape = schema.shape as Record<string, z.ZodType>;
    const out: Record<string, unknown> = {};
    for (const [k, s] of Object.entries(shape)) {
      const v = parsePart(s, raw[k], prevRaw[k], prev[k], path ? `${path}.${k}` : k, log);
      if (v !== undefined || k in prev) out[k] = v;
    }
    return out;
  }
  // Same length as last time: the array's own length checks still hold, so only changed elements are parsed.
  if (schema instanceof z.ZodArray && Array.isArray(raw) && Array.isArray(prevRaw) && Array.isArray(prev) && raw.length === prevRaw.length) {
    const el = schema.element as z.ZodType;
    return raw.map((x, i) => parsePart(el, x, prevRaw[i], prev[i], `${path}.${i}`, log));
  }
  return whole();
}

/** Parses `raw`, reusing `memo` (the previous frame's) for every part that has not changed. */
export function parseLiftInputIncremental(raw: LiftInputIn, memo: ParseMemo | null): IncrementalParse {
  if (memo) {
    const log: string[] = [];
    try {
      const input = parsePart(liftInputSchema, raw, memo.raw, memo.parsed, '', log) as LiftInput;
      markValidated(input);
      return { input, memo: { raw, parsed: input }, parsed: log };
    } catch (e) {
      if (!(e instanceof PartFailed)) throw e;
    }
  }
  // First frame, or a part failed: the full parse gives the input or the error naming the field.
  const input = parseLiftInput(raw);
  return { input, memo: { raw, parsed: input }, parsed: [''] };
}
