import type { ReactNode } from 'react';

export function PageHeader({ title, eyebrow, description, actions }: { title: ReactNode; eyebrow?: ReactNode; description?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b-2 border-ink pb-4">
      <div className="min-w-0">
        {eyebrow && <p className="mb-1 text-caption font-bold uppercase tracking-[0.14em] text-teal">{eyebrow}</p>}
        <h1 className="text-title text-ink">{title}</h1>
        {description && <p className="mt-1 max-w-3xl text-body text-ink-muted">{description}</p>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-3">{actions}</div>}
    </header>
  );
}
