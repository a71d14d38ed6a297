'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import type { LoadChart } from '@/lib/equipment/truck-spec';
import { chartToCsv, parseChartText } from '@/lib/equipment/load-chart-text';
import { ftToM, kgToLb, lbToKg, mToFt, type UnitSystem } from '@/lib/units';
import { UnitInput } from './unit-input';

type Grid = Pick<LoadChart, 'radii' | 'boomLengths' | 'rated'>;

// Pasted and exported numbers: feet and pounds, or metres and kilograms (decimal, not ft-in, so a spreadsheet can read them).
const lenIn = (v: number, u: UnitSystem) => (u === 'metric' ? v : ftToM(v));
const lenOut = (v: number, u: UnitSystem) => Math.round((u === 'metric' ? v : mToFt(v)) * 100) / 100;
const massIn = (v: number, u: UnitSystem) => (u === 'metric' ? v : lbToKg(v));
const massOut = (v: number, u: UnitSystem) => Math.round(u === 'metric' ? v : kgToLb(v));

/** Rows: radius; columns: boom length; cells: rated load. Paste a block from a spreadsheet, or export CSV. */
export function LoadChartGrid({ value, onChange, units, disabled, errors }: { value: Grid; onChange: (g: Grid) => void; units: UnitSystem; disabled?: boolean; errors: { path: string; message: string }[] }) {
  const [paste, setPaste] = useState('');
  const [pasteError, setPasteError] = useState<string | null>(null);
  const lenUnit = units === 'metric' ? 'm' : 'ft';
  const massUnit = units === 'metric' ? 'kg' : 'lb';

  const applyPaste = (text: string) => {
    const p = parseChartText(text);
    if (!p.ok) return setPasteError(p.error);
    setPasteError(null);
    setPaste('');
    onChange({
      radii: p.chart.radii.map((r) => lenIn(r, units)),
      boomLengths: p.chart.boomLengths.map((b) => lenIn(b, units)),
      rated: p.chart.rated.map((row) => row.map((v) => (v === null ? null : massIn(v, units)))),
    });
  };

  const exportCsv = () => {
    const csv = chartToCsv(
      { radii: value.radii.map((r) => lenOut(r, units)), boomLengths: value.boomLengths.map((b) => lenOut(b, units)), rated: value.rated.map((row) => row.map((v) => (v === null ? null : massOut(v, units)))) },
      `radius ${lenUnit} \\ boom ${lenUnit} (rated ${massUnit})`,
    );
    const a = document.createElement('a');
    a.href = URL.createObjectURL(new Blob([csv], { type: 'text/csv' }));
    a.download = 'load-chart.csv';
    a.click();
    URL.revokeObjectURL(a.href);
  };

  const setCell = (i: number, j: number, v: number | null) => onChange({ ...value, rated: value.rated.map((row, r) => (r === i ? row.map((c, k) => (k === j ? v : c)) : row)) });
  const addRow = () => onChange({ ...value, radii: [...value.radii, (value.radii.at(-1) ?? 2) + 1], rated: [...value.rated, value.boomLengths.map(() => null)] });
  const removeRow = (i: number) => onChange({ ...value, radii: value.radii.filter((_, k) => k !== i), rated: value.rated.filter((_, k) => k !== i) });
  const addColumn = () => onChange({ ...value, boomLengths: [...value.boomLengths, (value.boomLengths.at(-1) ?? 5) + 1], rated: value.rated.map((row) => [...row, null]) });
  const removeColumn = (j: number) => onChange({ ...value, boomLengths: value.boomLengths.filter((_, k) => k !== j), rated: value.rated.map((row) => row.filter((_, k) => k !== j)) });
  const errAt = (p: string) => errors.find((e) => e.path === p)?.message;

  return (
    <div className="space-y-3">
      {/* The grid scrolls inside its card, both ways, with the boom lengths and radii kept in view. */}
      <div role="region" className="max-h-[30rem] overflow-auto overscroll-contain rounded-plate border border-paper-line" data-testid="load-chart-scroller" tabIndex={0} aria-label="Load chart grid (scrolls)">
        <table className="border-separate border-spacing-0 text-left" aria-label="Load chart">
          <thead className="sticky top-0 z-20 bg-paper-sunk">
            <tr>
              <th scope="col" className="sticky left-0 z-30 bg-paper-sunk px-2 py-1 text-caption text-ink-soft">
                Radius ↓ / boom →
              </th>
              {value.boomLengths.map((b, j) => (
                <th key={j} scope="col" className="min-w-[8.5rem] px-1 py-1">
                  <UnitInput bare label={`Boom length, column ${j + 1}`} quantity="length" units={units} value={b} disabled={disabled} error={errAt(`spec.loadChart.boomLengths.${j}`)} onChange={(v) => onChange({ ...value, boomLengths: value.boomLengths.map((x, k) => (k === j ? (v ?? NaN) : x)) })} />
                  {!disabled && value.boomLengths.length > 1 && (
                    <button type="button" className="mt-0.5 min-h-touch text-caption text-over underline" onClick={() => removeColumn(j)}>
                      Remove column
                    </button>
                  )}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {value.radii.map((r, i) => (
              <tr key={i}>
                <th scope="row" className="sticky left-0 z-10 min-w-[8.5rem] border-t border-r border-paper-line bg-paper-raised px-1 py-1">
                  <UnitInput bare label={`Radius, row ${i + 1}`} quantity="length" units={units} value={r} disabled={disabled} error={errAt(`spec.loadChart.radii.${i}`)} onChange={(v) => onChange({ ...value, radii: value.radii.map((x, k) => (k === i ? (v ?? NaN) : x)) })} />
                  {!disabled && value.radii.length > 1 && (
                    <button type="button" className="mt-0.5 min-h-touch text-caption text-over underline" onClick={() => removeRow(i)}>
                      Remove row
                    </button>
                  )}
                </th>
                {value.boomLengths.map((_, j) => (
                  <td key={j} className="border-t border-paper-line px-1 py-1 align-top">
                    <UnitInput bare label={`Rated load at row ${i + 1}, column ${j + 1}`} quantity="mass" units={units} value={value.rated[i]?.[j] ?? null} disabled={disabled} error={errAt(`spec.loadChart.rated.${i}.${j}`)} onChange={(v) => setCell(i, j, v)} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {errors.length > 0 && (
        <ul className="space-y-1 text-label font-semibold text-over" data-testid="chart-errors">
          {errors.map((e) => (
            <li key={e.path + e.message}>! {e.message}</li>
          ))}
        </ul>
      )}
      <div className="flex flex-wrap gap-2">
        {!disabled && (
          <>
            <Button variant="secondary" onClick={addRow}>
              + Radius row
            </Button>
            <Button variant="secondary" onClick={addColumn}>
              + Boom column
            </Button>
          </>
        )}
        <Button variant="secondary" onClick={exportCsv}>
          Export chart as CSV
        </Button>
      </div>
      {!disabled && (
        <div className="space-y-2">
          <label htmlFor="chart-paste" className="text-label text-ink">
            Paste from a spreadsheet
          </label>
          <p className="text-caption text-ink-muted">
            Copy the block with boom lengths ({lenUnit}) across the top and radii ({lenUnit}) down the left, rated loads in {massUnit}; leave a cell empty where there is no rating. Pasting replaces the grid.
          </p>
          <textarea
            id="chart-paste"
            value={paste}
            rows={4}
            onChange={(e) => setPaste(e.target.value)}
            onPaste={(e) => {
              e.preventDefault();
              applyPaste(e.clipboardData.getData('text'));
            }}
            className="block w-full rounded-plate border-2 border-paper-edge bg-paper-raised px-3 py-2 font-mono text-caption"
            placeholder={`\t20\t34\t48\n10\t90000\t72000\t55000`}
          />
          <Button variant="secondary" onClick={() => applyPaste(paste)} disabled={!paste.trim()}>
            Use pasted chart
          </Button>
          {pasteError && <Notice tone="error" title="Could not read the pasted chart">{pasteError}</Notice>}
        </div>
      )}
    </div>
  );
}
