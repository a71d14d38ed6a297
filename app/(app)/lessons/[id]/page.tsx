import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { getDb } from '@/db';
import { getLesson } from '@/db/repositories/lessons';
import { getCurrentUser } from '@/lib/auth/current-user';
import { may } from '@/lib/auth/permissions';
import { idParams } from '@/lib/api/route';
import { PageHeader } from '@/components/ui/page-header';
import { ButtonLink } from '@/components/ui/button';
import { LessonForm } from '@/components/lessons/lesson-form';
import { DeleteLessonButton } from '@/components/lessons/delete-lesson-button';
import { trainingScenes } from '../training-scenes';

export const metadata: Metadata = { title: 'Lesson' };

export default async function LessonPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const p = idParams.safeParse(await params);
  if (!p.success) notFound();
  const db = getDb();
  const lesson = await getLesson(db, user, p.data.id);
  if (!lesson) notFound();
  const writer = may(user, 'writeLessons');
  const first = lesson.steps[0];
  const stepHref = (k: number, present: boolean) => `/scenes/${lesson.steps[k].sceneId}/replay?revision=${lesson.steps[k].revision}${present ? '&present=1' : ''}&lesson=${lesson.id}&step=${k}`;
  return (
    <>
      <PageHeader
        eyebrow="Lesson"
        title={lesson.title}
        description={`${lesson.steps.length} steps · built by ${lesson.authorName}`}
        actions={first ? <ButtonLink href={stepHref(0, true)} variant="signal" size="lg">Present</ButtonLink> : undefined}
      />
      <ol className="grid gap-3" data-testid="lesson-steps">
        {lesson.steps.map((s, k) => (
          <li key={k} className="rounded-plate border-2 border-paper-line bg-paper-raised p-3">
            <p className="font-bold">
              Step {k + 1}: {s.sceneTitle ?? 'a scene you cannot open'} · revision {s.revision}
            </p>
            {s.notes && <p className="mt-1">{s.notes}</p>}
            {s.question && <p className="mt-1"><b>Question:</b> {s.question}{s.answer ? <> · <b>Answer:</b> {s.answer}</> : null}</p>}
            {s.sceneTitle && <Link className="mt-1 inline-block text-sm font-semibold text-teal-dark underline" href={stepHref(k, false)}>Open in the replay</Link>}
          </li>
        ))}
      </ol>
      {writer && (
        <section className="mt-8 grid gap-3">
          <h2 className="text-lg font-bold">Edit this lesson</h2>
          <LessonForm
            scenes={await trainingScenes(db, user)}
            initial={{ id: lesson.id, title: lesson.title, steps: lesson.steps.map((s) => ({ sceneId: s.sceneId, revision: s.revision, notes: s.notes, question: s.question ?? '', answer: s.answer ?? '' })) }}
          />
          <DeleteLessonButton id={lesson.id} />
        </section>
      )}
    </>
  );
}
