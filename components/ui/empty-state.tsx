import type { ReactNode } from 'react';

/** What a list shows when it has nothing: a plain sentence, and the next step when there is one. */
export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-plate border-2 border-dashed border-paper-edge bg-paper px-6 py-10 text-center">
      <svg aria-hidden viewBox="0 0 48 48" className="h-12 w-12 text-ink-muted">
        <path d="M8 34 A16 16 0 0 1 40 34" fill="none" stroke="currentColor" strokeWidth="3" strokeDasharray="4 4" strokeLinecap="round" />
        <rect x="14" y="36" width="20" height="4" rx="1.5" fill="currentColor" />
      </svg>
      <p className="text-heading text-ink">{title}</p>
      {children && <div className="max-w-prose text-body text-ink-muted">{children}</div>}
      {action && <div className="mt-1">{action}</div>}
    </div>
  );
}
