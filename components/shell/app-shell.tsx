import Link from 'next/link';
import type { ReactNode } from 'react';
import type { CurrentUser } from '@/lib/domain';
import { Wordmark } from '@/components/logo';
import { SignOutButton } from '@/components/sign-out-button';
import { AppNav, type NavItem } from './app-nav';
import { may } from '@/lib/auth/permissions';

const ROLE_LABEL: Record<CurrentUser['role'], string> = {
  operator: 'Operator',
  supervisor: 'Supervisor',
  trainer: 'Trainer',
  admin: 'Administrator',
};

export const roleLabel = (role: CurrentUser['role']) => ROLE_LABEL[role];

/** Counts beside the navigation, worked out by the (app) layout on the server. */
export interface NavCounts {
  /** Plans awaiting review (supervisors and admins), null for other roles. */
  review: number | null;
  unread: number;
}

export function navItemsFor(user: CurrentUser, counts: NavCounts = { review: null, unread: 0 }): NavItem[] {
  const items: NavItem[] = [{ href: '/scenes', label: 'Scenes', icon: 'scenes' }];
  if (counts.review !== null) items.push({ href: '/review', label: 'Review', icon: 'review', count: { value: counts.review, label: `${counts.review} awaiting review` } });
  items.push(
    { href: '/notifications', label: 'Notifications', icon: 'bell', count: { value: counts.unread, label: `${counts.unread} unread` } },
    { href: '/equipment', label: 'Equipment', icon: 'equipment' },
    { href: '/rigging', label: 'Rigging', icon: 'rigging' },
    { href: '/lessons', label: 'Lessons', icon: 'scenes' },
  );
  if (may(user, 'manageUsers')) items.push({ href: '/admin/users', label: 'Users', icon: 'users' });
  items.push({ href: '/settings', label: 'Settings', icon: 'settings' });
  return items;
}

function WhoAmI({ user }: { user: CurrentUser }) {
  return (
    <div data-testid="who-am-i" className="min-w-0">
      <p className="truncate text-body font-bold text-paper-raised">{user.name}</p>
      <p className="truncate text-caption text-paper-raised/80">
        <span className="mr-1.5 inline-block rounded-sm bg-signal px-1.5 font-bold text-ink">{roleLabel(user.role)}</span>
        {user.organisationName}
      </p>
    </div>
  );
}

/**
 * The signed-in frame. At 1024 px and wider (laptop, landscape tablet) a dark sidebar; narrower (portrait
 * tablet) a dark top bar with the nav as tabs underneath. Dark chrome keeps the page itself the brightest thing.
 */
export function AppShell({ user, counts, children }: { user: CurrentUser; counts?: NavCounts; children: ReactNode }) {
  const items = navItemsFor(user, counts);
  return (
    <div className="min-h-screen lg:grid lg:grid-cols-[15.5rem_1fr] lg:bg-[linear-gradient(to_right,#15202B_15.5rem,transparent_15.5rem)]">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-signal focus:px-3 focus:py-2">
        Skip to content
      </a>
      <aside className="hidden bg-ink lg:sticky lg:top-0 lg:flex lg:h-screen lg:flex-col lg:gap-6 lg:px-4 lg:py-5">
        <Link href="/scenes" className="rounded-plate px-1">
          <Wordmark inverted />
        </Link>
        <AppNav items={items} orientation="vertical" />
        <div className="mt-auto flex flex-col gap-3 border-t border-paper-raised/20 pt-4">
          <WhoAmI user={user} />
          <SignOutButton variant="signal" />
        </div>
      </aside>
      <header className="bg-ink px-4 pt-3 lg:hidden">
        <div className="flex items-center justify-between gap-4">
          <Link href="/scenes" className="rounded-plate">
            <Wordmark inverted />
          </Link>
          <div className="flex min-w-0 items-center gap-3">
            <WhoAmI user={user} />
            <SignOutButton variant="signal" />
          </div>
        </div>
        <div className="mt-2">
          <AppNav items={items} orientation="horizontal" />
        </div>
      </header>
      <main id="main" className="min-w-0 px-5 py-6 sm:px-8 lg:px-10 lg:py-8">
        <div className="mx-auto max-w-6xl">{children}</div>
      </main>
    </div>
  );
}
