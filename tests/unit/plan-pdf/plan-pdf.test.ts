import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { call } from '@/tests/setup/call';
import { sceneIdByTitle } from '@/tests/setup/fixtures';
import { GET as pdfRoute } from '@/app/api/scenes/[id]/plan.pdf/route';
import { GET as analysisRoute } from '@/app/api/scenes/[id]/analysis/route';
import { PUT as saveDetails } from '@/app/api/scenes/[id]/details/route';
import { CAUTION_LINES } from '@/lib/caution';
import { dualMass, dualPressure } from '@/lib/format/dual';
import { governingLineWords } from '@/components/plan-pdf/format';
import { emptyPlanDetails } from '@/lib/plan-details/schema';
import type { LiftResult } from '@/lib/lift';
import { fetchPlanPdf, flat, wordBoxes, type FetchedPdf } from './render-helpers';

/**
 * The plan document, read back with pdftotext (Debian's poppler-utils). Every figure asserted here is taken
 * from the server's own analysis of the same revision (GET /api/scenes/{id}/analysis), never typed in.
 */
const COIL = 'Coil transfer, Route 9 weigh station';
const REEFER = 'Overturned reefer trailer, Mill Creek on-ramp';
let coil = '';
let reefer = '';
let draft: FetchedPdf;
let figures: LiftResult;

beforeAll(async () => {
  await freshSeededDb();
  coil = String(await sceneIdByTitle(COIL));
  reefer = String(await sceneIdByTitle(REEFER));
  signInAs(await demoUser('operator@harrow.example'));
  draft = await fetchPlanPdf(pdfRoute, coil);
  figures = (await call({ handler: analysisRoute, method: 'GET', id: coil })).json as unknown as LiftResult;
}, 120_000);

// Rendering is real work; on a machine shared with other jobs it can take many seconds (no time is asserted).
describe('lift plan PDF', { timeout: 120_000 }, () => {
  it('is a PDF of the latest revision, well under 1 MB, with the title, header and page numbers on every page', () => {
    expect(draft.status).toBe(200);
    expect(draft.bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(draft.bytes.length).toBeLessThan(1024 * 1024);
    expect(draft.pages.length).toBeGreaterThanOrEqual(3);
    draft.pages.forEach((page, i) => {
      expect(page).toContain(COIL);
      expect(page).toContain('Harrow Ridge Recovery');
      expect(page).toMatch(/Revision 1\b/);
      expect(flat(page)).toMatch(new RegExp(`page ${i + 1} of ${draft.pages.length}`, 'i'));
    });
    expect(flat(draft.pages[0])).toMatch(/page 1 of/i);
  });

  it('explains every pad code the drawing shows, in a key under it', () => {
    const page = flat(draft.pages[0]);
    const key = /Pads: ([^\n]+)/.exec(page)?.[1] ?? '';
    const entries = [...key.matchAll(/\b([A-Z]{1,3}\d?) ([a-z][a-z ]+?)(?= ·|\s*$)/g)].map((m) => [m[1], m[2].trim()]);
    const names: Record<string, string> = { FL: 'left front', FR: 'right front', RL: 'left rear', RR: 'right rear', FJ: 'front jack' };
    expect(entries.length).toBeGreaterThanOrEqual(4);
    for (const [code, name] of entries) expect(name).toBe(names[code]);
    // Every code standing alone on the drawing page has its entry in the key.
    const onPage = new Set(page.replace(/Pads: [^\n]+/, '').match(/\b(FL|FR|RL|RR|FJ)\b/g) ?? []);
    expect(onPage.size).toBeGreaterThanOrEqual(4);
    for (const code of onPage) expect(entries.map((e) => e[0])).toContain(code);
  });

  it('carries the caution on every page', () => {
    // Each page's footer: the caution wraps over two lines, so look for its opening words per page and the whole in reading order.
    for (const page of draft.pages) expect(flat(page)).toContain("The manufacturer's load chart and operator's manual govern.");
    for (const line of CAUTION_LINES) expect(draft.prose).toContain(line);
  });

  it('shows the server’s worst case, governing line, pad reactions and rigging for that revision', () => {
    const text = flat(draft.pages.join('\n'));
    const w = figures.worstCase;
    expect(w.percentOfTipping).toBeGreaterThan(0);
    expect(text).toContain(`${w.percentOfTipping.toFixed(1)} % of tipping at slew ${w.slew.toFixed(1)}°, governing tipping line: ${governingLineWords(figures.checks, w.line)}`);
    expect(governingLineWords(figures.checks, w.line)).toContain(w.line);
    expect(text).toContain(`Worst case: ${w.percentOfTipping.toFixed(1)} % at slew ${w.slew.toFixed(0)}°`);
    expect(text).toMatch(new RegExp(`Governing tipping line: [a-z ]+ \\(${w.line}\\)`));
    expect(figures.reactions.maxima.length).toBe(5);
    for (const m of figures.reactions.maxima) {
      // One ground-table row per support: its largest reaction and its pressure, in the operator's units (lb first).
      expect(text).toMatch(new RegExp(`${m.support} +${escape(dualMass(m.mass, 'imperial'))} \\(${m.force.toFixed(1)} kN\\).*${escape(dualPressure(m.pressure, 'imperial'))}`));
    }
    expect(figures.rigging.length).toBeGreaterThan(0);
    for (const r of figures.rigging.filter((x) => x.element !== 'winch')) {
      expect(text).toMatch(new RegExp(`${escape(r.id)} .*${escape(dualMass(r.capacity, 'imperial'))} +${Math.round((100 * r.demand) / r.capacity)} %`));
    }
    // Every check's verdict is listed.
    expect((text.match(/Within limit|Near limit|Over limit/g) ?? []).length).toBe(figures.checks.length);
  });

  it('has the plan details and the sign-off names', () => {
    const text = flat(draft.pages.join('\n'));
    for (const name of ['Mitch Varga', 'Dana Okafor', 'Lee Marsh']) expect(text).toContain(name);
    expect(text).toContain('Prepared by Dana Okafor, revision 1');
    expect(text).toContain('Brindlewood Coil Carriers (demo)');
    expect(text).toContain('Emergency action plan');
    expect(text).toContain('Feeder 13.8 kV');
  });

  it('marks a draft DRAFT on every page and an approved plan not at all', async () => {
    for (const page of draft.pages) expect(page).toContain('Status: DRAFT');
    const approved = await fetchPlanPdf(pdfRoute, reefer);
    expect(approved.status).toBe(200);
    expect(approved.pages.length).toBeGreaterThanOrEqual(3);
    for (const page of approved.pages) expect(page).toContain('Status: Approved');
    expect(approved.prose).not.toMatch(/DRAFT/);
    expect(approved.prose).toContain(REEFER);
  });

  it('shows figures in the viewer’s units first: metric for a metric user', async () => {
    const me = await demoUser('operator@harrow.example');
    signInAs({ ...me, units: 'metric' });
    const metric = await fetchPlanPdf(pdfRoute, coil);
    const m = figures.reactions.maxima[0];
    expect(flat(metric.pages.join('\n'))).toContain(dualMass(m.mass, 'metric'));
    expect(dualMass(m.mass, 'metric')).toMatch(/kg \(.* lb\)$/);
    signInAs(me);
  });

  it('answers 404 for an unknown revision and 400 for a malformed one, and reads an older revision as it was', async () => {
    const unknown = await fetchPlanPdf(pdfRoute, coil, 'revision=42');
    expect(unknown.status).toBe(404);
    expect(unknown.json?.issues?.[0].path).toBe('query.revision');
    expect((await fetchPlanPdf(pdfRoute, coil, 'revision=abc')).status).toBe(400);
    signInAs(await demoUser('operator@cobalt.example'));
    expect((await fetchPlanPdf(pdfRoute, coil)).status).toBe(404);
    signInAs(await demoUser('operator@harrow.example'));
  });

  it('wraps long text and continues tables onto the next page', async () => {
    const words = (n: number, tag: string) => Array.from({ length: n }, (_, i) => `${tag}${i}`).join(' ');
    const hazards = Array.from({ length: 20 }, (_, i) => ({ hazard: words(60, `h${i}w`).slice(0, 500), control: words(60, `c${i}w`).slice(0, 500) }));
    const details = { ...emptyPlanDetails(), hazards, contingency: words(300, 'cont').slice(0, 2000), job: { customer: 'W'.repeat(120), reference: '', location: '', when: '' } };
    const saved = await call({ handler: saveDetails, method: 'PUT', id: coil, body: { revision: 1, details } });
    expect(saved.status).toBe(200);
    const long = await fetchPlanPdf(pdfRoute, coil, 'revision=2');
    expect(long.status).toBe(200);
    expect(long.pages.length).toBeGreaterThan(draft.pages.length);
    const text = flat(long.pages.join('\n'));
    // The last words of the last hazard and of the contingency are there: nothing was cut off.
    expect(text).toContain('h19w');
    expect(text).toContain('c19w');
    expect(long.prose).toContain('cont0 cont1');
    // The hazards table runs over more than one page, its header repeated on each.
    const withHazards = long.pages.filter((p) => /\bh\d+w\d+/.test(p));
    expect(withHazards.length).toBeGreaterThan(1);
    for (const p of withHazards) expect(flat(p)).toMatch(/Hazard +Control/);
    // A 120-letter word with no break in it is wrapped within its column, not cut: every letter is there.
    expect((text.match(/W/g) ?? []).length).toBeGreaterThanOrEqual(120);
    // No word runs past the right margin (Letter is 612 pt wide, 36 pt margins); the DRAFT mark's big letters excepted.
    const boxes = wordBoxes(long.file).filter((b) => b.yMax - b.yMin < 40);
    expect(boxes.length).toBeGreaterThan(500);
    expect(Math.max(...boxes.map((b) => b.xMax))).toBeLessThanOrEqual(612 - 36 + 1);
    expect(Math.min(...boxes.map((b) => b.xMin))).toBeGreaterThanOrEqual(36 - 1);
  });
});

function escape(s: string) {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
