'use client';

import type { SaveState } from './types';

/** Each state has its own icon shape and words, so it reads without colour. */
const LOOK: Record<SaveState['status'], { label: string; detail?: string; short?: string; tone: string; icon: React.ReactNode }> = {
  saved: {
    label: 'Saved',
    tone: 'border-within/40 bg-within-light text-within',
    icon: <path d="M4 10.5l4 4 8-9" fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" strokeLinejoin="round" />,
  },
  pending: {
    label: 'Unsaved changes',
    detail: 'saving shortly',
    tone: 'border-paper-line bg-paper-raised text-ink-soft',
    icon: <circle cx="10" cy="10" r="4" fill="currentColor" />,
  },
  saving: {
    label: 'Saving…',
    tone: 'border-teal/40 bg-teal-light text-teal-dark',
    icon: (
      <g fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round">
        <path d="M15.5 7A6 6 0 0 0 4.6 8" />
        <path d="M4.5 13a6 6 0 0 0 10.9-1" />
        <path d="M15.8 3.5V7h-3.5M4.2 16.5V13h3.5" strokeLinejoin="round" />
      </g>
    ),
  },
  offline: {
    label: 'Offline',
    detail: 'changes kept on this device',
    short: 'kept on this device',
    tone: 'border-signal-dark/50 bg-signal-light text-ink',
    icon: (
      <g fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round">
        <path d="M6 15h8.5a3.5 3.5 0 0 0 .4-7A5 5 0 0 0 5.3 9 3 3 0 0 0 6 15z" />
        <path d="M3 3l14 14" />
      </g>
    ),
  },
  conflict: {
    label: 'Conflict',
    detail: 'someone else saved; choose a version',
    short: 'choose a version',
    tone: 'border-over/50 bg-over-light text-over',
    icon: (
      <g fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" strokeLinecap="round">
        <path d="M10 2.8L18 17H2z" />
        <path d="M10 8v4M10 14.6v.2" />
      </g>
    ),
  },
  error: {
    label: 'Not saved',
    tone: 'border-over/50 bg-over-light text-over',
    icon: (
      <g fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round">
        <circle cx="10" cy="10" r="7" />
        <path d="M7.3 7.3l5.4 5.4M12.7 7.3l-5.4 5.4" />
      </g>
    ),
  },
};

export function SaveIndicator({ state, compact = false }: { state: SaveState; compact?: boolean }) {
  const look = LOOK[state.status];
  const detail = state.status === 'error' ? state.message : state.status === 'offline' && !state.dirty ? 'edits will be kept on this device' : look.detail;
  return (
    <div
      role="status"
      aria-live="polite"
      data-save-status={state.status}
      title={detail ? `${look.label}: ${detail}` : look.label}
      className={`inline-flex min-h-11 max-w-full items-center gap-2 rounded-full border px-3 py-1.5 text-sm font-semibold ${look.tone}`}
    >
      <svg viewBox="0 0 20 20" width="20" height="20" aria-hidden="true" className={`shrink-0 ${state.status === 'saving' ? 'animate-spin [animation-duration:1.6s]' : ''}`}>
        {look.icon}
      </svg>
      <span className="whitespace-nowrap">{look.label}</span>
      {detail && !compact && <span className="hidden truncate font-normal lg:inline">— {detail}</span>}
      {compact && look.short && <span className="hidden whitespace-nowrap font-normal xl:inline">— {look.short}</span>}
      {state.status === 'saved' && state.revision > 0 && !compact && <span className="font-normal text-within/80">rev {state.revision}</span>}
    </div>
  );
}
