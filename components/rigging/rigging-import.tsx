'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError, fetchJson } from '@/lib/client/fetch-json';
import { RIGGING_CSV_COLUMNS, type CsvRowError } from '@/lib/equipment/rigging-csv';

/** CSV import: every row or none. Row errors are listed by line and column. */
export function RiggingImport({ onImported }: { onImported: () => void }) {
  const [csv, setCsv] = useState('');
  const [result, setResult] = useState<{ ok: true; n: number } | { ok: false; error: string; rows: CsvRowError[] } | null>(null);
  const [busy, setBusy] = useState(false);
  const submit = async () => {
    setBusy(true);
    try {
      const r = await fetchJson<{ imported: number }>('/api/rigging/import', { method: 'POST', body: JSON.stringify({ csv }) });
      setResult({ ok: true, n: r.imported });
      setCsv('');
      onImported();
    } catch (e) {
      if (e instanceof ApiError) setResult({ ok: false, error: e.message, rows: (e.body.rowErrors as CsvRowError[]) ?? [] });
      else setResult({ ok: false, error: 'Could not reach the server', rows: [] });
    } finally {
      setBusy(false);
    }
  };
  return (
    <section aria-labelledby="import-title" className="rounded-plate border border-paper-line bg-paper-raised p-5 shadow-plate">
      <h2 id="import-title" className="text-heading">
        Import from CSV
      </h2>
      <p className="mt-1 text-body text-ink-muted">
        Columns: <code className="break-all">{RIGGING_CSV_COLUMNS.join(',')}</code>. Lengths in metres, ratings in kg; leave the ratings blank for a round sling
        (by colour), a shackle (by size) or a chain (e.g. &ldquo;3/8 in grade 80&rdquo;) to fill them from the built-in tables. If any row is wrong, nothing is imported.
      </p>
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <label className="min-w-0 max-w-full text-label">
          Choose a file{' '}
          <input type="file" accept=".csv,text/csv" className="mt-1 block min-h-touch w-full max-w-full text-body" onChange={async (e) => setCsv((await e.target.files?.[0]?.text()) ?? '')} />
        </label>
      </div>
      <label htmlFor="rigging-csv" className="mt-3 block text-label">
        Or paste the CSV
      </label>
      <textarea id="rigging-csv" value={csv} onChange={(e) => setCsv(e.target.value)} rows={5} className="mt-1 block w-full rounded-plate border-2 border-paper-edge px-3 py-2 font-mono text-caption" />
      <Button className="mt-3" onClick={submit} disabled={busy || !csv.trim()}>
        {busy ? 'Importing…' : 'Import'}
      </Button>
      {result?.ok && (
        <Notice tone="success" className="mt-3">
          Imported {result.n} item{result.n === 1 ? '' : 's'}.
        </Notice>
      )}
      {result && !result.ok && (
        <div className="mt-3 space-y-2">
          <Notice tone="error" title="Nothing was imported">
            {result.error.replace(/^Nothing was imported: /, '')}
          </Notice>
          {result.rows.length > 0 && (
            <table className="w-full border-collapse text-left text-body" aria-label="Import problems">
              <thead>
                <tr className="border-b-2 border-ink">
                  <th className="py-1 pr-3">Line</th>
                  <th className="py-1 pr-3">Column</th>
                  <th className="py-1">Problem</th>
                </tr>
              </thead>
              <tbody>
                {result.rows.map((r, i) => (
                  <tr key={i} className="border-b border-paper-line">
                    <td className="py-1 pr-3 tabular-nums">{r.row}</td>
                    <td className="py-1 pr-3">{r.field}</td>
                    <td className="py-1">{r.message}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </div>
      )}
    </section>
  );
}
