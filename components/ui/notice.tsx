import type { ReactNode } from 'react';
import { cx } from './cx';

export type NoticeTone = 'info' | 'error' | 'success' | 'warning';

const tones: Record<NoticeTone, { box: string; glyph: string; word: string }> = {
  info: { box: 'border-teal bg-teal-light text-teal-dark', glyph: 'i', word: 'Note' },
  error: { box: 'border-over bg-over-light text-over', glyph: '!', word: 'Problem' },
  success: { box: 'border-within bg-within-light text-within', glyph: '✓', word: 'Done' },
  warning: { box: 'border-signal-dark bg-signal-light text-ink', glyph: '!', word: 'Heads up' },
};

/** A boxed message with a heavy left rule. role=alert for errors so screen readers announce them. */
export function Notice({ tone = 'info', title, children, actions, className }: { tone?: NoticeTone; title?: ReactNode; children?: ReactNode; actions?: ReactNode; className?: string }) {
  const t = tones[tone];
  return (
    <div role={tone === 'error' || tone === 'warning' ? 'alert' : 'status'} className={cx('flex gap-3 rounded-plate border-2 border-l-[6px] px-4 py-3', t.box, className)}>
      <span aria-hidden className="mt-0.5 inline-flex h-6 w-6 shrink-0 items-center justify-center rounded-full bg-current text-sm font-bold">
        <span className="text-paper-raised">{t.glyph}</span>
      </span>
      <div className="min-w-0 flex-1">
        <p className="text-label font-bold">{title ?? t.word}</p>
        {children && <div className="mt-0.5 text-body text-ink">{children}</div>}
        {actions && <div className="mt-3 flex flex-wrap gap-2">{actions}</div>}
      </div>
    </div>
  );
}
