import type { ReactNode } from 'react';
import type { SceneStatus } from '@/lib/domain';
import { cx } from './cx';
import { AppIcon, type IconName } from './icons';

export type BadgeTone = 'neutral' | 'teal' | 'signal' | 'within' | 'over' | 'ink';

const tones: Record<BadgeTone, string> = {
  neutral: 'border-paper-edge bg-paper-sunk text-ink',
  teal: 'border-teal bg-teal-light text-teal-dark',
  signal: 'border-signal-dark bg-signal-light text-ink',
  within: 'border-within bg-within-light text-within',
  over: 'border-over bg-over-light text-over',
  ink: 'border-ink bg-ink text-paper-raised',
};

/** A small label. Always carries words; the glyph (an icon name or a node) and colour only reinforce them. */
export function Badge({ tone = 'neutral', glyph, children, className }: { tone?: BadgeTone; glyph?: IconName | ReactNode; children: ReactNode; className?: string }) {
  return (
    <span className={cx('inline-flex items-center gap-1.5 rounded-full border-[1.5px] px-2.5 py-0.5 text-caption font-semibold whitespace-nowrap', tones[tone], className)}>
      {glyph && (
        <span aria-hidden className="inline-flex w-3.5 justify-center text-[0.8rem] leading-none">
          {typeof glyph === 'string' ? <AppIcon name={glyph as IconName} className="h-3.5 w-3.5" /> : glyph}
        </span>
      )}
      {children}
    </span>
  );
}

// Each status has its own word, colour and glyph, so it reads in greyscale and in glare.
const STATUS: Record<SceneStatus, { label: string; tone: BadgeTone; glyph: IconName }> = {
  draft: { label: 'Draft', tone: 'neutral', glyph: 'pencil' },
  submitted: { label: 'Awaiting review', tone: 'signal', glyph: 'clock' },
  approved: { label: 'Approved', tone: 'within', glyph: 'check' },
  returned: { label: 'Returned for changes', tone: 'over', glyph: 'cross' },
  archived: { label: 'Archived', tone: 'teal', glyph: 'box' },
};

export const statusLabel = (s: SceneStatus) => STATUS[s].label;

export function StatusPill({ status }: { status: SceneStatus }) {
  const s = STATUS[status];
  return (
    <Badge tone={s.tone} glyph={s.glyph}>
      {s.label}
    </Badge>
  );
}

/** For computed results: "within limit" / "over limit" with the margin text the caller supplies. */
export function LimitPill({ over, children }: { over: boolean; children?: ReactNode }) {
  return (
    <Badge tone={over ? 'over' : 'within'} glyph={over ? 'alert' : 'check'}>
      {over ? 'Over limit' : 'Within limit'}
      {children && <span className="font-medium">· {children}</span>}
    </Badge>
  );
}
