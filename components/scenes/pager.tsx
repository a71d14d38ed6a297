import { Button } from '@/components/ui/button';

export function Pager({ page, pageSize, total, onPage, busy }: { page: number; pageSize: number; total: number; onPage: (p: number) => void; busy?: boolean }) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3">
      <p className="text-body text-ink-soft" aria-live="polite">
        Showing <strong className="text-ink">{first}–{last}</strong> of <strong className="text-ink">{total}</strong> {total === 1 ? 'scene' : 'scenes'} · page {page} of{' '}
        {pages}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" onClick={() => onPage(page - 1)} disabled={page <= 1 || busy}>
          ← Previous
        </Button>
        <Button variant="secondary" onClick={() => onPage(page + 1)} disabled={page >= pages || busy}>
          Next →
        </Button>
      </div>
    </nav>
  );
}
