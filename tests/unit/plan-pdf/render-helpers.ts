import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Handler } from '@/tests/setup/route-matrix';

/** Calls the plan PDF route and returns the status, the bytes and the text pdftotext reads from them. */
export interface FetchedPdf {
  status: number;
  bytes: Buffer;
  /** pdftotext -layout: one string per page. */
  pages: string[];
  /** pdftotext in reading order, whitespace collapsed: for sentences that wrap. */
  prose: string;
  file: string;
  json: { error?: string; issues?: { path: string }[] } | null;
}

export async function fetchPlanPdf(handler: Handler, id: string, query = ''): Promise<FetchedPdf> {
  const res = await handler(new Request(`http://arcline.test/api/scenes/${id}/plan.pdf${query ? `?${query}` : ''}`), { params: Promise.resolve({ id }) });
  const bytes = Buffer.from(await res.arrayBuffer());
  if (!res.ok) return { status: res.status, bytes, pages: [], prose: '', file: '', json: JSON.parse(bytes.toString('utf8')) };
  const dir = mkdtempSync(path.join(tmpdir(), 'plan-pdf-'));
  const file = path.join(dir, 'plan.pdf');
  writeFileSync(file, bytes);
  // -layout keeps table rows on one line; whitespace is normalised so wrapped phrases still match.
  const layout = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
  const prose = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
  return { status: res.status, bytes, pages: layout.split('\f').filter((p) => p.trim() !== ''), prose, file, json: null };
}

/** Text with runs of spaces collapsed (pdftotext pads columns). */
export const flat = (t: string) => t.replace(/[ \t]+/g, ' ');

/** Every word's box on its page, points (pdftotext -bbox). */
export function wordBoxes(file: string): { xMin: number; xMax: number; yMin: number; yMax: number }[] {
  const html = execFileSync('pdftotext', ['-bbox', file, '-'], { encoding: 'utf8' });
  return [...html.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">/g)].map((m) => ({ xMin: +m[1], yMin: +m[2], xMax: +m[3], yMax: +m[4] }));
}
