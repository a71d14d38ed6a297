import { riggingItemSchema } from '@/lib/validations/rigging';
import { parseDelimited, toCsv } from './csv';
import { resolveRatings, type ResolvedRiggingItem } from './rigging-item';

/**
 * The rigging inventory's CSV format (ours): one item per row, SI units named in the headers. Export
 * writes exactly these columns, so an exported file imports again unchanged.
 */
export const RIGGING_CSV_COLUMNS = [
  'tag',
  'kind',
  'size',
  'length_m',
  'vertical_kg',
  'choker_kg',
  'basket_kg',
  'status',
  'last_inspection',
  'next_inspection_due',
  'notes',
] as const;

export interface CsvRowError {
  /** 1-based line number in the file, the header being line 1. */
  row: number;
  field: string;
  message: string;
}

export type RiggingCsvParse = { ok: true; items: ResolvedRiggingItem[] } | { ok: false; errors: CsvRowError[] };

function num(cell: string | undefined): number | null | typeof NaN {
  const t = (cell ?? '').trim();
  if (t === '') return null;
  const n = Number(t.replace(/,/g, ''));
  return Number.isFinite(n) ? n : NaN;
}

const FIELD_TO_COLUMN: Record<string, string> = {
  length: 'length_m',
  'ratings.vertical': 'vertical_kg',
  'ratings.choker': 'choker_kg',
  'ratings.basket': 'basket_kg',
  lastInspection: 'last_inspection',
  nextInspectionDue: 'next_inspection_due',
};

/** Parses and validates every row; any bad row means no items (the caller imports nothing). */
export function parseRiggingCsv(text: string): RiggingCsvParse {
  const rows = parseDelimited(text);
  if (rows.length === 0) return { ok: false, errors: [{ row: 1, field: 'header', message: 'The file is empty' }] };
  const header = rows[0].map((h) => h.trim().toLowerCase());
  // Only tag and kind are required columns; the rest may be left out (blank) or filled from tables.
  const missing = ['tag', 'kind'].filter((c) => !header.includes(c));
  if (missing.length) return { ok: false, errors: [{ row: 1, field: 'header', message: `Missing column(s): ${missing.join(', ')}. Expected: ${RIGGING_CSV_COLUMNS.join(',')}` }] };
  const unknown = header.filter((h) => !(RIGGING_CSV_COLUMNS as readonly string[]).includes(h));
  if (unknown.length) return { ok: false, errors: [{ row: 1, field: 'header', message: `Unknown column(s): ${unknown.join(', ')}` }] };
  if (rows.length === 1) return { ok: false, errors: [{ row: 1, field: 'header', message: 'The file has a header but no items' }] };

  const errors: CsvRowError[] = [];
  const items: ResolvedRiggingItem[] = [];
  const seenTags = new Map<string, number>();
  rows.slice(1).forEach((cells, k) => {
    const line = k + 2;
    const get = (c: string) => {
      const i = header.indexOf(c);
      return i < 0 ? undefined : cells[i];
    };
    if (cells.length > header.length) {
      errors.push({ row: line, field: 'row', message: `Row has ${cells.length} cells but the header has ${header.length}` });
      return;
    }
    const numbers = { length_m: num(get('length_m')), vertical_kg: num(get('vertical_kg')), choker_kg: num(get('choker_kg')), basket_kg: num(get('basket_kg')) };
    let bad = false;
    for (const [col, v] of Object.entries(numbers)) {
      if (Number.isNaN(v)) {
        errors.push({ row: line, field: col, message: `${col} "${get(col)}" is not a number` });
        bad = true;
      }
    }
    if (bad) return;
    const blankToNull = (v: string | undefined) => (v === undefined || v.trim() === '' ? null : v.trim());
    const parsed = riggingItemSchema.safeParse({
      tag: get('tag') ?? '',
      kind: (get('kind') ?? '').trim().toLowerCase(),
      size: get('size') ?? '',
      length: numbers.length_m,
      ratings: { vertical: numbers.vertical_kg, choker: numbers.choker_kg, basket: numbers.basket_kg },
      status: blankToNull(get('status'))?.toLowerCase().replace(/[ -]/g, '_') ?? undefined,
      lastInspection: blankToNull(get('last_inspection')),
      nextInspectionDue: blankToNull(get('next_inspection_due')),
      notes: get('notes') ?? '',
    });
    if (!parsed.success) {
      for (const i of parsed.error.issues) {
        const path = i.path.map(String).join('.');
        errors.push({ row: line, field: FIELD_TO_COLUMN[path] ?? path, message: i.message });
      }
      return;
    }
    const resolved = resolveRatings(parsed.data);
    if (!resolved.ok) {
      for (const i of resolved.issues) errors.push({ row: line, field: FIELD_TO_COLUMN[i.path] ?? i.path, message: i.message });
      return;
    }
    const first = seenTags.get(resolved.item.tag);
    if (first !== undefined) {
      errors.push({ row: line, field: 'tag', message: `Tag ${resolved.item.tag} is already used on row ${first}` });
      return;
    }
    seenTags.set(resolved.item.tag, line);
    items.push(resolved.item);
  });
  return errors.length ? { ok: false, errors } : { ok: true, items };
}

const round = (v: number | null, digits: number) => (v === null ? null : Math.round(v * 10 ** digits) / 10 ** digits);

export function riggingToCsv(items: { tag: string; kind: string; size: string; length: number | null; ratings: { vertical: number | null; choker: number | null; basket: number | null }; status: string; lastInspection: string | null; nextInspectionDue: string | null; notes: string }[]): string {
  return toCsv([
    [...RIGGING_CSV_COLUMNS],
    ...items.map((i) => [
      i.tag,
      i.kind,
      i.size,
      round(i.length, 3),
      round(i.ratings.vertical, 1),
      round(i.ratings.choker, 1),
      round(i.ratings.basket, 1),
      i.status,
      i.lastInspection,
      i.nextInspectionDue,
      i.notes,
    ]),
  ]);
}
