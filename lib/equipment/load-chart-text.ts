import { parseDelimited, toCsv } from './csv';

/**
 * Load chart as text, for paste and export. Layout (ours): the first row holds the boom lengths after
 * one corner cell; each following row is a radius then its rated loads. Blank or "-" cells are "no rating".
 * Numbers are in the units the caller states; conversion to SI is the caller's.
 */
export interface ChartText {
  radii: number[];
  boomLengths: number[];
  rated: (number | null)[][];
}

export type ChartTextParse = { ok: true; chart: ChartText } | { ok: false; error: string };

const cellNumber = (s: string) => {
  const t = s.trim().replace(/[, ]/g, '');
  if (t === '' || t === '-' || t === '—') return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : NaN;
};

/** Reads tab-separated text (from a spreadsheet) or CSV into a chart grid. */
export function parseChartText(text: string): ChartTextParse {
  const rows = parseDelimited(text, text.includes('\t') ? '\t' : ',');
  if (rows.length < 2) return { ok: false, error: 'Paste at least a header row of boom lengths and one row of radius and rated loads' };
  const boomLengths = rows[0].slice(1).map(cellNumber);
  if (boomLengths.length === 0 || boomLengths.some((b) => b === null || Number.isNaN(b))) {
    return { ok: false, error: 'The first row must be a corner cell then a boom length in every column' };
  }
  const radii: number[] = [];
  const rated: (number | null)[][] = [];
  for (let i = 1; i < rows.length; i++) {
    const r = cellNumber(rows[i][0] ?? '');
    if (r === null || Number.isNaN(r)) return { ok: false, error: `Row ${i + 1}: the first cell must be the radius` };
    const cells = rows[i].slice(1).map(cellNumber);
    const bad = cells.findIndex((c) => Number.isNaN(c));
    if (bad >= 0) return { ok: false, error: `Row ${i + 1}, column ${bad + 2}: "${rows[i][bad + 1]}" is not a number` };
    while (cells.length < boomLengths.length) cells.push(null);
    if (cells.length > boomLengths.length) return { ok: false, error: `Row ${i + 1} has more cells than there are boom lengths` };
    radii.push(r);
    rated.push(cells);
  }
  return { ok: true, chart: { radii, boomLengths: boomLengths as number[], rated } };
}

export function chartToCsv(chart: ChartText, cornerLabel: string): string {
  return toCsv([[cornerLabel, ...chart.boomLengths], ...chart.radii.map((r, i) => [r, ...chart.rated[i].map((v) => (v === null ? '' : v))])]);
}
