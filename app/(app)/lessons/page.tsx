import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { getDb } from '@/db';
import { listLessons } from '@/db/repositories/lessons';
import { getCurrentUser } from '@/lib/auth/current-user';
import { may } from '@/lib/auth/permissions';
import { PageHeader } from '@/components/ui/page-header';
import { EmptyState } from '@/components/ui/empty-state';
import { LessonForm } from '@/components/lessons/lesson-form';
import { LocalTime } from '@/components/local-time';
import { trainingScenes } from './training-scenes';

export const metadata: Metadata = { title: 'Lessons' };

export default async function LessonsPage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const db = getDb();
  const lessons = await listLessons(db, user.organisationId);
  const writer = may(user, 'writeLessons');
  return (
    <>
      <PageHeader eyebrow={user.organisationName} title="Lessons" description="Ordered walk-throughs of training-set scenes, each step at a chosen revision, presented from the replay room." />
      {lessons.length === 0 ? (
        <EmptyState title="No lessons yet">{writer ? 'Build the first one below.' : 'A trainer builds lessons from the training set.'}</EmptyState>
      ) : (
        <ul className="grid gap-2" data-testid="lesson-list">
          {lessons.map((l) => (
            <li key={l.id} className="flex flex-wrap items-baseline justify-between gap-2 rounded-plate border-2 border-paper-line bg-paper-raised p-3">
              <Link href={`/lessons/${l.id}`} className="text-lg font-semibold text-teal-dark underline">{l.title}</Link>
              <span className="text-sm text-ink-muted">{l.stepCount} steps · {l.authorName} · <LocalTime iso={l.updatedAt} /></span>
            </li>
          ))}
        </ul>
      )}
      {writer && (
        <section className="mt-8">
          <h2 className="mb-3 text-lg font-bold">New lesson</h2>
          <LessonForm scenes={await trainingScenes(db, user)} />
        </section>
      )}
    </>
  );
}
