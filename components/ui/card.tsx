import type { ComponentProps, ReactNode } from 'react';
import { cx } from './cx';

export function Card({ className, ...rest }: ComponentProps<'section'>) {
  return <section className={cx('rounded-plate border border-paper-line bg-paper-raised shadow-plate', className)} {...rest} />;
}

interface CardHeaderProps {
  title: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  /** Heading level: cards inside a page are h2 by default. */
  as?: 'h2' | 'h3';
}

export function CardHeader({ title, description, actions, as: H = 'h2' }: CardHeaderProps) {
  return (
    <header className="flex flex-wrap items-start justify-between gap-3 border-b border-paper-line px-5 py-4">
      <div className="min-w-0">
        <H className="text-heading text-ink">{title}</H>
        {description && <p className="mt-0.5 text-body text-ink-muted">{description}</p>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-2">{actions}</div>}
    </header>
  );
}

export function CardBody({ className, ...rest }: ComponentProps<'div'>) {
  return <div className={cx('px-5 py-4', className)} {...rest} />;
}

/** Label / value pairs, e.g. a scene's owner and revision. */
export function FactList({ items }: { items: { label: string; value: ReactNode }[] }) {
  return (
    <dl className="grid grid-cols-[minmax(7rem,auto)_1fr] gap-x-6 gap-y-2.5">
      {items.map((i) => (
        <div key={i.label} className="contents">
          <dt className="text-label leading-[1.625rem] text-ink-muted">{i.label}</dt>
          <dd className="text-body font-medium text-ink">{i.value}</dd>
        </div>
      ))}
    </dl>
  );
}
