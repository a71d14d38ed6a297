import type { Metadata } from 'next';
import Link from 'next/link';
import { forbidden, redirect } from 'next/navigation';
import { getDb } from '@/db';
import { listDeletedScenes } from '@/db/repositories/scene-actions';
import { getCurrentUser } from '@/lib/auth/current-user';
import { may } from '@/lib/auth/permissions';
import { RESTORE_WINDOW_DAYS, daysLeftToRestore } from '@/lib/scene/retention';
import { PageHeader } from '@/components/ui/page-header';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { StatusPill } from '@/components/ui/badge';
import { LocalTime } from '@/components/local-time';
import { RestoreSceneButton } from '@/components/scenes/restore-scene-button';

export const metadata: Metadata = { title: 'Recently deleted scenes' };

export default async function DeletedScenesPage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  if (!may(user, 'restoreScene')) forbidden();
  const scenes = await listDeletedScenes(getDb(), user);
  return (
    <>
      <p className="mb-3">
        <Link href="/scenes" className="inline-flex min-h-touch items-center font-semibold text-teal-dark underline-offset-4 hover:underline">
          ← All scenes
        </Link>
      </p>
      <PageHeader
        eyebrow={user.organisationName}
        title="Recently deleted"
        description={`Scenes deleted in the last ${RESTORE_WINDOW_DAYS} days. Restore one to put it back in the list as it was; after ${RESTORE_WINDOW_DAYS} days it can no longer be restored.`}
      />
      {scenes.length === 0 ? (
        <EmptyState title="Nothing deleted recently">Deleted scenes wait here for {RESTORE_WINDOW_DAYS} days.</EmptyState>
      ) : (
        <Card>
          <ul className="divide-y divide-paper-line" aria-label="Deleted scenes">
            {scenes.map((s) => (
              <li key={s.id} className="flex flex-wrap items-center justify-between gap-3 px-5 py-3">
                <div className="min-w-0 flex-1">
                  <p className="font-semibold break-words">{s.title}</p>
                  <p className="text-caption text-ink-muted">
                    {s.ownerName}
                    {s.location ? ` · ${s.location}` : ''} · deleted <LocalTime iso={s.deletedAt} /> · {daysLeftToRestore(s.deletedAt)} days left
                  </p>
                </div>
                <StatusPill status={s.status} />
                <RestoreSceneButton sceneId={s.id} title={s.title} />
              </li>
            ))}
          </ul>
        </Card>
      )}
    </>
  );
}
