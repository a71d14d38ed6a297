import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as exportRoute from '@/app/api/rigging/export/route';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { parseDelimited, csvCell } from '@/lib/equipment/csv';
import { parseRiggingCsv } from '@/lib/equipment/rigging-csv';
import type { DB } from '@/db';

let db: DB;
beforeAll(async () => {
  db = await freshSeededDb();
});

// OWASP "CSV Injection": cells starting with =, +, -, @, tab or carriage return are prefixed with ' and quoted.
describe('CSV export neutralises formula-leading cells', () => {
  it('an exported cell "=1+1" comes out as \'=1+1, and the file imports back to =1+1', async () => {
    const admin = await demoUser('admin@harrow.example');
    const item = await db.selectFrom('rigging_items').select(['id', 'tag']).where('organisation_id', '=', admin.organisationId).orderBy('id').executeTakeFirstOrThrow();
    await db.updateTable('rigging_items').set({ notes: '=1+1' }).where('id', '=', item.id).execute();
    signInAs(admin);
    const res = await exportRoute.GET(new Request('http://arcline.test/api/rigging/export'), { params: Promise.resolve({}) });
    expect(res.status).toBe(200);
    const text = await res.text();
    expect(text).toContain(`"'=1+1"`);
    expect(text).not.toMatch(/(^|,)=1\+1/m);
    // Read back the header and this item's row (the export also lists flagged non-lifting rows, which an import refuses).
    const lines = text.split(/\r?\n/);
    const parsed = parseRiggingCsv([lines[0], ...lines.filter((l) => l.startsWith(`${item.tag},`))].join('\n'));
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(parsed.items.find((i) => i.tag === item.tag)?.notes).toBe('=1+1');
  });

  it('neutralises every formula lead, leaves ordinary text and our own numbers alone', () => {
    for (const lead of ['=', '+', '-', '@', '\t', '\r']) expect(csvCell(`${lead}cmd`)).toBe(`"'${lead.replace('"', '""')}cmd"`);
    expect(csvCell('1/2 in alloy chain')).toBe('1/2 in alloy chain');
    expect(csvCell(-3.5)).toBe('-3.5');
    expect(parseDelimited(`a,"'=HYPERLINK(x)"\r\n`)).toEqual([['a', '=HYPERLINK(x)']]);
    // A quote that does not guard a formula lead is ordinary text.
    expect(parseDelimited(`"'tis fine"\r\n`)).toEqual([["'tis fine"]]);
  });
});
