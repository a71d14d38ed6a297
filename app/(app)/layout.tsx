import { redirect } from 'next/navigation';
import type { ReactNode } from 'react';
import { getCurrentUser } from '@/lib/auth/current-user';
import { AppShell } from '@/components/shell/app-shell';
import { getDb } from '@/db';
import { navCounts } from '@/lib/server/review-queue';

export const dynamic = 'force-dynamic';

/** Session guard for every signed-in page; each page still checks its own role and organisation. */
export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  return (
    <AppShell user={user} counts={await navCounts(getDb(), user)}>
      {children}
    </AppShell>
  );
}
