import { cx } from '@/components/ui/cx';

/** The mark drawn inline (same drawing as public/arcline-mark.svg) so it needs no request. */
export function ArclineMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 64 64" aria-hidden className={cx('h-9 w-9 shrink-0', className)}>
      <rect width="64" height="64" rx="14" fill="#15202B" />
      <path d="M12 42 A20 20 0 0 1 52 42" fill="none" stroke="#F2A900" strokeWidth="5" strokeLinecap="round" />
      <path d="M32 42 L46 22" stroke="#FFFFFF" strokeWidth="4.5" strokeLinecap="round" />
      <circle cx="46" cy="22" r="4.5" fill="#F2A900" stroke="#15202B" strokeWidth="1.5" />
      <rect x="17" y="45" width="30" height="5" rx="2" fill="#3FA7AE" />
      <rect x="13" y="49" width="7" height="4" rx="1" fill="#FFFFFF" />
      <rect x="44" y="49" width="7" height="4" rx="1" fill="#FFFFFF" />
      <circle cx="32" cy="42" r="3.5" fill="#FFFFFF" />
    </svg>
  );
}

export function Wordmark({ inverted = false, className }: { inverted?: boolean; className?: string }) {
  return (
    <span className={cx('inline-flex items-center gap-2.5', className)}>
      <ArclineMark className={inverted ? 'ring-1 ring-paper-raised/25 rounded-[10px]' : undefined} />
      <span className={cx('text-[1.375rem] font-extrabold tracking-[-0.02em]', inverted ? 'text-paper-raised' : 'text-ink')}>
        Arc<span className={inverted ? 'text-signal' : 'text-teal'}>line</span>
      </span>
    </span>
  );
}
