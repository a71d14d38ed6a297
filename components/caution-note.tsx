import { CAUTION_LINES } from '@/lib/caution';
import { cx } from '@/components/ui/cx';

/**
 * The standing caution. Put it on every screen and export that shows computed results. `compact` is for
 * tight panels (one paragraph, smaller type); the full form lists each line.
 */
export function CautionNote({ compact = false, className }: { compact?: boolean; className?: string }) {
  return (
    <aside
      aria-label="Caution"
      data-testid="caution-note"
      className={cx('relative overflow-hidden rounded-plate border-2 border-ink bg-signal-light text-ink', compact ? 'px-3 py-2' : 'px-4 py-3', className)}
    >
      {/* hatched edge: the caution reads as a caution without relying on the amber */}
      <span aria-hidden className="hatch absolute inset-y-0 left-0 w-2 text-ink" />
      <div className="pl-3">
        <p className={cx('font-bold uppercase tracking-[0.12em]', compact ? 'text-[0.7rem]' : 'text-caption')}>Planning aid — read before use</p>
        {compact ? (
          <p className="mt-0.5 text-caption">{CAUTION_LINES.join(' ')}</p>
        ) : (
          <ul className="mt-1 list-disc space-y-0.5 pl-5 text-body">
            {CAUTION_LINES.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        )}
      </div>
    </aside>
  );
}
