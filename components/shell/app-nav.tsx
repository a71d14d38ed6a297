'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { cx } from '@/components/ui/cx';
import { AppIcon, type IconName } from '@/components/ui/icons';

export interface NavItem {
  href: string;
  label: string;
  icon: IconName;
  /** A count shown beside the label (plans awaiting review, unread notifications); hidden at 0. */
  count?: { value: number; label: string };
}

/**
 * Main navigation. Vertical in the laptop / landscape sidebar; a row of tabs on a portrait tablet that wraps
 * rather than hiding tabs off the edge; a row that scrolls sideways on a phone.
 */
export function AppNav({ items, orientation }: { items: NavItem[]; orientation: 'vertical' | 'horizontal' }) {
  const path = usePathname();
  const vertical = orientation === 'vertical';
  return (
    <nav aria-label="Main">
      <ul className={cx(vertical ? 'flex flex-col gap-1' : 'flex gap-1 overflow-x-auto md:flex-wrap md:overflow-visible')}>
        {items.map((item) => {
          const active = path === item.href || path.startsWith(item.href + '/');
          return (
            <li key={item.href}>
              <Link
                href={item.href}
                aria-current={active ? 'page' : undefined}
                className={cx(
                  'flex min-h-touch items-center rounded-plate text-body font-semibold whitespace-nowrap',
                  vertical ? 'gap-3 border-l-4 px-3' : 'gap-2 border-b-4 rounded-b-none px-2.5',
                  active ? 'border-signal bg-paper-raised/10 text-paper-raised' : 'border-transparent text-paper-raised/80 hover:bg-paper-raised/10 hover:text-paper-raised',
                )}
              >
                <span className={cx(active ? 'text-signal' : 'text-teal-bright')}>
                  <AppIcon name={item.icon} />
                </span>
                {item.label}
                {item.count && item.count.value > 0 && (
                  <span data-testid={`nav-count-${item.icon}`} aria-label={item.count.label} className="ml-auto min-w-6 rounded-full bg-signal px-1.5 text-center text-caption font-bold text-ink">
                    {item.count.value}
                  </span>
                )}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
