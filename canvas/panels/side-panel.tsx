'use client';
import { useState } from 'react';
import { Inspector } from './inspector/inspector';
import { ResultsPanel } from './results/results-panel';
import { CautionLine } from './caution-line';
import { DRAWER_SNAPS, DrawerGrip } from './drawer-grip';
import { useEditorState } from '../editor-context';
import { AdvisorPanel } from '../advisor/advisor-panel';

/** Exact values and results beside the plan; on narrow screens it slides over the plan when asked for. */
export function SidePanel() {
  const [tab, setTab] = useState<'inspector' | 'results' | 'advisor'>('inspector');
  const [open, setOpen] = useState(false);
  // Over the plan (below lg): a third of the editor's width until the grip moves it.
  const [width, setWidth] = useState<number | string>(DRAWER_SNAPS[0]);
  const selected = useEditorState((s) => s.selection.join(','));
  const tabs = (
    <div role="tablist" className="flex shrink-0 border-b border-paper-line">
      {(['inspector', 'results', 'advisor'] as const).map((t) => (
        <button
          key={t}
          role="tab"
          type="button"
          aria-selected={tab === t}
          data-testid={`tab-${t}`}
          onClick={() => setTab(t)}
          className={`min-h-11 flex-1 text-sm font-semibold ${tab === t ? 'border-b-4 border-signal text-ink' : 'text-ink-muted hover:bg-paper-sunk'}`}
        >
          {t === 'inspector' ? 'Details' : t === 'results' ? 'Results' : 'Placement'}
        </button>
      ))}
      <button type="button" onClick={() => setOpen(false)} className="min-h-11 px-3 text-sm text-teal lg:hidden" aria-label="Hide the panel">
        Hide
      </button>
    </div>
  );
  return (
    <>
      <button
        type="button"
        onClick={() => setOpen(true)}
        className={`absolute right-3 top-24 z-20 min-h-11 rounded-md border border-teal bg-paper-raised px-3 text-sm font-semibold text-teal shadow lg:hidden ${open ? 'hidden' : ''}`}
        data-testid="open-panel"
      >
        Details & results
      </button>
      <aside
        aria-label="Details and results"
        data-testid="side-panel"
        style={{ '--drawer-w': typeof width === 'number' ? `${width * 100}%` : width } as React.CSSProperties}
        className={`${open ? 'flex' : 'hidden'} absolute inset-y-0 right-0 z-30 w-[max(300px,var(--drawer-w))] max-w-[calc(100%-48px)] flex-col border-l border-paper-line bg-paper-raised shadow-xl lg:static lg:flex lg:w-[360px] lg:max-w-none lg:shadow-none xl:w-[400px]`}
      >
        <DrawerGrip share={width} onResize={setWidth} />
        {tabs}
        {/* Keyed on the selection so the details of a newly selected object open at the top. */}
        <div key={tab === 'inspector' ? `i:${selected}` : tab} className="min-h-0 flex-1 overflow-y-auto p-3">
          {tab === 'inspector' ? <Inspector /> : tab === 'results' ? <ResultsPanel /> : <AdvisorPanel />}
        </div>
        {tab === 'inspector' && <CautionLine className="shrink-0 border-t border-paper-line bg-signal-light px-3 py-1.5" testId="details-caution" />}
      </aside>
    </>
  );
}
