import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { GET as list, POST as create } from '@/app/api/rigging/route';
import { GET as getOne, PUT as update } from '@/app/api/rigging/[id]/route';
import { GET as inspections, POST as inspect } from '@/app/api/rigging/[id]/inspections/route';
import { POST as importCsv } from '@/app/api/rigging/import/route';
import { GET as exportCsv } from '@/app/api/rigging/export/route';
import { KG_PER_LB } from '@/lib/units';

const ctx = (params: Record<string, string>) => ({ params: Promise.resolve(params) });
const json = (method: string, body: unknown) => ({ method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } });
const url = 'http://t/api/rigging';
type Item = { id: number; tag: string; kind: string; status: string; ratings: { vertical: number | null; choker: number | null; basket: number | null }; ratingSource: string; nextInspectionDue: string | null };
const items = async (q = ''): Promise<Item[]> => (await (await list(new Request(`${url}${q}`))).json()).items;

beforeAll(async () => {
  await freshSeededDb();
});

describe('rigging list and filters', () => {
  it('lists the seeded inventory of the organisation only', async () => {
    signInAs(await demoUser('supervisor@harrow.example'));
    const all = await items();
    expect(all.length).toBe(15);
    expect(all.every((i) => i.tag.startsWith('HR-'))).toBe(true);
  });
  it('filters by kind, status and inspection due', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    expect((await items('?kind=shackle')).map((i) => i.tag)).toEqual(['HR-SH-01', 'HR-SH-02', 'HR-SH-03']);
    expect((await items('?status=tagged_out')).map((i) => i.tag)).toEqual(['HR-CH-02']);
    expect((await items('?due=overdue')).map((i) => i.tag)).toEqual(['HR-RS-05']);
    expect((await items('?due=due-30')).map((i) => i.tag)).toEqual(['HR-RS-04']);
    expect((await items('?due=none')).map((i) => i.tag)).toEqual(['HR-CH-02']);
    expect((await items('?status=in_service')).some((i) => i.status !== 'in_service')).toBe(false);
  });
  it('answers 400 naming the field for an unknown filter value', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const res = await list(new Request(`${url}?kind=rope`));
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe('query.kind');
  });
});

describe('rigging items: create, update, inspect', () => {
  it('fills a blue round sling from the WSTDA colour table (value from memory: 21 200 / 17 000 / 42 400 lb)', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const res = await create(new Request(url, json('POST', { tag: 'HR-RS-20', kind: 'round-sling', size: 'Blue', length: 3 })));
    expect(res.status).toBe(201);
    const it = (await res.json()) as Item;
    expect(it.ratings.vertical).toBeCloseTo(21200 * KG_PER_LB, 6);
    expect(it.ratings.choker).toBeCloseTo(17000 * KG_PER_LB, 6);
    // Common practice (no published source): basket = 2 × vertical for a round sling.
    expect(it.ratings.basket).toBeCloseTo(2 * it.ratings.vertical!, 6);
    expect(it.ratingSource).toBe('wstda-rs1');
  });
  it('fills a 5/8 shackle (3.25 t = 6 500 lb, value from memory) and a 3/8 grade 80 chain (7 100 lb, ASTM A906 sling table, read)', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const sh = (await (await create(new Request(url, json('POST', { tag: 'HR-SH-20', kind: 'shackle', size: '5/8' })))).json()) as Item;
    expect(sh.ratings.vertical).toBeCloseTo(6500 * KG_PER_LB, 6);
    const ch = (await (await create(new Request(url, json('POST', { tag: 'HR-CH-20', kind: 'chain', size: '3/8 G80', length: 6 })))).json()) as Item;
    expect(ch.ratings.vertical).toBeCloseTo(7100 * KG_PER_LB, 6);
    expect(ch.ratingSource).toBe('astm-a906');
    // A real 7/32 in grade 80 sling: 2 100 lb (makers' A906 tables, read), not the tie-down table's 3 500.
    const small = (await (await create(new Request(url, json('POST', { tag: 'HR-CH-21', kind: 'chain', size: '7/32 in grade 80' })))).json()) as Item;
    expect(small.ratings.vertical).toBeCloseTo(2100 * KG_PER_LB, 6);
  });
  it('refuses items that are not lifting rigging, naming the field and saying why', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const g70 = await create(new Request(url, json('POST', { tag: 'HR-CH-22', kind: 'chain', size: '3/8 in grade 70' })));
    expect(g70.status).toBe(400);
    const g70Issue = (await g70.json()).issues[0];
    expect(g70Issue.path).toBe('size');
    expect(g70Issue.message).toMatch(/^Not lifting rigging: Grade 70 chain is tie-down and towing chain, not a lifting sling/);
    // The tie-down table's "1/4 in" (7 mm) is sold for lifting as 9/32 in.
    const quarter = await create(new Request(url, json('POST', { tag: 'HR-CH-23', kind: 'chain', size: '1/4 in grade 80' })));
    expect((await quarter.json()).issues[0].message).toMatch(/sold as 9\/32 in/);
    const strap = await create(new Request(url, json('POST', { tag: 'HR-ST-22', kind: 'recovery-strap', size: '75 mm', ratings: { vertical: 5000, choker: null, basket: null } })));
    expect(strap.status).toBe(400);
    expect((await strap.json()).issues[0]).toEqual({ path: 'kind', message: 'Not lifting rigging: A recovery strap is made for pulling (winching), not for lifting: it has no sling rating.' });
  });
  it('flags rows stored before the lifting rules with the reason, keeps their figures, and lets them be edited as they are', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const strap = (await items('?kind=recovery-strap'))[0] as Item & { notForLifting: string | null; size: string; length: number | null };
    expect(strap.notForLifting).toMatch(/made for pulling/);
    expect(strap.ratings.vertical).toBe(9072);
    const id = String(strap.id);
    const body = { tag: strap.tag, kind: strap.kind, size: strap.size, length: strap.length, ratings: strap.ratings, status: 'retired' };
    const put = await update(new Request(`${url}/${id}`, json('PUT', body)), ctx({ id }));
    expect(put.status).toBe(200);
    expect(await put.json()).toMatchObject({ status: 'retired', notForLifting: strap.notForLifting, ratings: { vertical: 9072 } });
    // Turning a lifting item into a non-lifting one is refused like a new one.
    const sling = (await items('?kind=round-sling'))[0] as Item & { notForLifting: string | null };
    expect(sling.notForLifting).toBeNull();
    const sid = String(sling.id);
    expect((await update(new Request(`${url}/${sid}`, json('PUT', { tag: sling.tag, kind: 'recovery-strap', size: 'x' })), ctx({ id: sid }))).status).toBe(400);
    signInAs(await demoUser('operator@cobalt.example'));
    const g70 = (await items('?kind=chain')).find((i) => i.tag === 'CF-CH-01') as Item & { notForLifting: string | null };
    expect(g70.notForLifting).toMatch(/^Grade 70 chain/);
    expect(g70.ratingSource).toBe('cfr-393-108');
  });

  it('asks for a rating where no table applies, and refuses a duplicate tag with 409', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const res = await create(new Request(url, json('POST', { tag: 'HR-SB-20', kind: 'snatch-block', size: 'big' })));
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0]).toEqual({ path: 'ratings.vertical', message: 'Enter a vertical rating: no built-in table covers a snatch-block of size "big"' });
    const dup = await create(new Request(url, json('POST', { tag: 'HR-RS-01', kind: 'round-sling', size: 'green' })));
    expect(dup.status).toBe(409);
  });
  it('refuses a supervisor and a trainer (403): operators and admins manage rigging', async () => {
    for (const who of ['supervisor@harrow.example', 'trainer@harrow.example'] as const) {
      signInAs(await demoUser(who));
      expect((await create(new Request(url, json('POST', { tag: 'X-1', kind: 'round-sling', size: 'green' })))).status).toBe(403);
    }
  });
  it('records an inspection that moves the dates on; a failed one tags the item out', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const overdue = (await items('?due=overdue'))[0];
    const id = String(overdue.id);
    const today = new Date().toISOString().slice(0, 10);
    const nextYear = `${Number(today.slice(0, 4)) + 1}${today.slice(4)}`;
    const res = await inspect(new Request(`${url}/${id}/inspections`, json('POST', { inspectedOn: today, result: 'pass', nextDue: nextYear })), ctx({ id }));
    expect(res.status).toBe(201);
    expect((await res.json()).nextInspectionDue).toBe(nextYear);
    expect((await items('?due=overdue')).length).toBe(0);
    const fail = await inspect(new Request(`${url}/${id}/inspections`, json('POST', { inspectedOn: today, result: 'fail', nextDue: null, notes: 'cut cover' })), ctx({ id }));
    expect((await fail.json()).status).toBe('tagged_out');
    const hist = (await (await inspections(new Request(`${url}/${id}/inspections`), ctx({ id }))).json()).items;
    expect(hist.length).toBe(3);
    expect(hist[0]).toMatchObject({ result: 'fail', inspectorName: 'Dana Okafor' });
    const future = await inspect(new Request(`${url}/${id}/inspections`, json('POST', { inspectedOn: '2999-01-01', result: 'pass', nextDue: null })), ctx({ id }));
    expect(future.status).toBe(400);
    const badDate = await inspect(new Request(`${url}/${id}/inspections`, json('POST', { inspectedOn: '2026-02-30', result: 'pass' })), ctx({ id }));
    expect((await badDate.json()).issues[0]).toEqual({ path: 'inspectedOn', message: 'Inspection date is not a real calendar date' });
  });
  it('answers 404 for another organisation’s item on read, update and inspection', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    const theirs = (await items())[0];
    signInAs(await demoUser('operator@harrow.example'));
    const id = String(theirs.id);
    expect((await getOne(new Request(`${url}/${id}`), ctx({ id }))).status).toBe(404);
    expect((await update(new Request(`${url}/${id}`, json('PUT', { tag: 'MINE', kind: 'round-sling', size: 'green' })), ctx({ id }))).status).toBe(404);
    expect((await inspect(new Request(`${url}/${id}/inspections`, json('POST', { inspectedOn: '2026-01-01', result: 'pass' })), ctx({ id }))).status).toBe(404);
  });
});

describe('rigging CSV import and export', () => {
  const header = 'tag,kind,size,length_m,vertical_kg,choker_kg,basket_kg,status,last_inspection,next_inspection_due,notes';
  it('imports every row of a good file', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    const csv = [header, 'CF-RS-10,round-sling,yellow,3.05,,,,in_service,2026-11-01,2027-11-01,', 'CF-WS-10,web-sling,"50 mm, 2-ply",3,1450,1160,2900,,,,"web, ""new"""'].join('\n');
    const res = await importCsv(new Request(`${url}/import`, json('POST', { csv })));
    expect(res.status).toBe(201);
    expect(await res.json()).toEqual({ imported: 2 });
    const web = (await items('?kind=web-sling'))[0] as Item & { size: string; notes: string };
    expect(web).toMatchObject({ tag: 'CF-WS-10', size: '50 mm, 2-ply', notes: 'web, "new"', ratings: { vertical: 1450, choker: 1160, basket: 2900 } });
  });
  it('refuses a recovery strap in an import, with the reason on its row', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    const res = await importCsv(new Request(`${url}/import`, json('POST', { csv: [header, 'CF-ST-10,recovery-strap,100 mm,9.1,9000,,,,,,'].join('\n') })));
    expect(res.status).toBe(422);
    expect((await res.json()).rowErrors).toEqual([{ row: 2, field: 'kind', message: expect.stringMatching(/^Not lifting rigging: A recovery strap is made for pulling/) }]);
  });
  it('imports nothing when any row is bad, and names each row and field', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    const before = (await items()).length;
    const csv = [header, 'CF-RS-11,round-sling,green,3,,,,,,,', 'CF-XX-11,rope,,,,,,,,,', 'CF-SH-11,shackle,9/16,,,,,,,,', 'CF-RS-12,round-sling,red,abc,,,,,,,', 'CF-RS-11,round-sling,green,3,,,,,,,'].join('\n');
    const res = await importCsv(new Request(`${url}/import`, json('POST', { csv })));
    expect(res.status).toBe(422);
    const out = await res.json();
    expect(out.rowErrors).toEqual([
      { row: 3, field: 'kind', message: expect.stringContaining('Kind must be one of') },
      { row: 4, field: 'vertical_kg', message: 'Enter a vertical rating: no built-in table covers a shackle of size "9/16"' },
      { row: 5, field: 'length_m', message: 'length_m "abc" is not a number' },
      { row: 6, field: 'tag', message: 'Tag CF-RS-11 is already used on row 2' },
    ]);
    expect(out.error).toMatch(/^Nothing was imported: 4 problems/);
    expect((await items()).length).toBe(before);
  });
  it('refuses a file whose tag is already in the inventory, importing nothing', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    const before = (await items()).length;
    const res = await importCsv(new Request(`${url}/import`, json('POST', { csv: [header, 'CF-RS-13,round-sling,tan,,,,,,,,', 'CF-RS-01,round-sling,tan,,,,,,,,'].join('\n') })));
    expect(res.status).toBe(422);
    expect((await res.json()).rowErrors).toEqual([{ row: 3, field: 'tag', message: 'Tag CF-RS-01 is already in the inventory' }]);
    expect((await items()).length).toBe(before);
  });
  it('exports CSV that imports again as the same items', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    const res = await exportCsv(new Request(`${url}/export?kind=chain`));
    expect(res.headers.get('content-type')).toContain('text/csv');
    const text = await res.text();
    const lines = text.trim().split('\r\n');
    expect(lines[0]).toBe(header);
    // A row carried over from before the lifting rules exports as stored: 3/8 grade 70 chain rated from the
    // tie-down table, 6 600 lb (49 CFR 393.108) = 2 993.7 kg. 9/32 grade 100: 4 300 lb = 1 950.4 kg (A906, read).
    expect(lines[1]).toMatch(/^CF-CH-01,chain,3\/8 in grade 70,4\.9,2993\.7,,,in_service,/);
    expect(lines[2]).toMatch(/^CF-CH-02,chain,9\/32 in grade 100,3\.05,1950\.4,,,in_service,/);
    const { parseRiggingCsv } = await import('@/lib/equipment/rigging-csv');
    // The lifting chain imports again as the same item; the grade 70 row is refused with the reason.
    const again = parseRiggingCsv([lines[0], lines[2]].join('\n'));
    expect(again.ok && again.items.map((i) => [i.tag, i.ratings.vertical])).toEqual([['CF-CH-02', 1950.4]]);
    const g70 = parseRiggingCsv(text);
    expect(!g70.ok && g70.errors).toEqual([{ row: 2, field: 'size', message: expect.stringMatching(/^Not lifting rigging: Grade 70/) }]);
  });
  it('refuses an operator of another role: a trainer gets 403 on import', async () => {
    signInAs(await demoUser('trainer@harrow.example'));
    expect((await importCsv(new Request(`${url}/import`, json('POST', { csv: header })))).status).toBe(403);
  });
});

// Source: issue 11 — a rating of 1e300 kg was accepted; the range is the lift engine's own (lib/lift/range.ts).
describe('rigging physical ranges', () => {
  it('refuses a rating or a length past its range, naming the field and the range', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const huge = await create(new Request(url, json('POST', { tag: 'HR-RS-90', kind: 'round-sling', ratings: { vertical: 1e300, choker: null, basket: null } })));
    expect(huge.status).toBe(400);
    expect((await huge.json()).issues[0]).toEqual({ path: 'ratings.vertical', message: 'Vertical rating must be more than 0 and at most 10,000,000 kg' });
    const long = await create(new Request(url, json('POST', { tag: 'HR-RS-91', kind: 'round-sling', size: 'green', length: 1e6 })));
    expect(long.status).toBe(400);
    expect((await long.json()).issues[0]).toEqual({ path: 'length', message: 'Length must be more than 0 and at most 200 m' });
  });
});
