'use client';
import { useState } from 'react';
import { Inspector } from './inspector/inspector';
import { ResultsPanel } from './results/results-panel';
import { AdvisorPanel } from '../advisor/advisor-panel';

/** Exact values and results beside the plan; on narrow screens it slides over the plan when asked for. */
export function SidePanel() {
  const [tab, setTab] = useState<'inspector' | 'results' | 'advisor'>('inspector');
  const [open, setOpen] = useState(false);
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
        className={`absolute bottom-20 right-3 z-20 min-h-11 rounded-md border border-teal bg-paper-raised px-3 text-sm font-semibold text-teal shadow lg:hidden ${open ? 'hidden' : ''}`}
        data-testid="open-panel"
      >
        Details & results
      </button>
      <aside
        aria-label="Details and results"
        className={`${open ? 'flex' : 'hidden'} absolute inset-y-0 right-0 z-30 w-[min(380px,92vw)] flex-col border-l border-paper-line bg-paper-raised shadow-xl lg:static lg:flex lg:w-[360px] lg:shadow-none xl:w-[400px]`}
      >
        {tabs}
        <div className="min-h-0 flex-1 overflow-y-auto p-3">{tab === 'inspector' ? <Inspector /> : tab === 'results' ? <ResultsPanel /> : <AdvisorPanel />}</div>
      </aside>
    </>
  );
}
