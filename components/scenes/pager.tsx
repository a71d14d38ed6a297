import { Button } from '@/components/ui/button';

const count = new Intl.NumberFormat();

/** Previous / next by keyset cursor; the total is counted up to a cap and then shown as "10,000+". */
export function Pager({
  shown,
  total,
  totalCapped,
  onPrev,
  onNext,
  onFirst,
  busy,
}: {
  shown: number;
  total: number;
  totalCapped: boolean;
  onPrev?: () => void;
  onNext?: () => void;
  onFirst?: () => void;
  busy?: boolean;
}) {
  const of = totalCapped ? `${count.format(total)}+` : count.format(total);
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3">
      <p className="text-body text-ink-soft" aria-live="polite">
        Showing <strong className="text-ink">{shown}</strong> of <strong className="text-ink">{of}</strong> {total === 1 && !totalCapped ? 'scene' : 'scenes'}
      </p>
      <div className="flex flex-wrap gap-2">
        {onFirst && (
          <Button variant="secondary" onClick={onFirst} disabled={busy}>
            First page
          </Button>
        )}
        <Button variant="secondary" onClick={onPrev} disabled={!onPrev || busy}>
          ← Previous
        </Button>
        <Button variant="secondary" onClick={onNext} disabled={!onNext || busy}>
          Next →
        </Button>
      </div>
    </nav>
  );
}
