'use client';
import Link from 'next/link';
import { useState } from 'react';
import { cx } from '@/components/ui/cx';

/** The parts of a lesson step the replay shows (GET /api/lessons/{id}). */
export interface LessonStepView {
  sceneId: number;
  revision: number;
  notes: string;
  question: string | null;
  answer: string | null;
}

/** Where a lesson stands: step k of n, the trainer's notes, the question (answer on demand), previous and next. */
export function LessonBar({ lesson, present }: { lesson: { id: number; title: string; steps: LessonStepView[]; step: number }; present: boolean }) {
  const [shown, setShown] = useState(false);
  const s = lesson.steps[lesson.step];
  const href = (k: number) => {
    const t = lesson.steps[k];
    return `/scenes/${t.sceneId}/replay?revision=${t.revision}${present ? '&present=1' : ''}&lesson=${lesson.id}&step=${k}`;
  };
  const big = present ? 'text-[28px]' : 'text-sm';
  return (
    <section aria-label="Lesson" className={cx('grid gap-2 rounded-plate border-2 p-3', present ? 'border-[#F2A900]' : 'border-teal')} data-testid="lesson-bar">
      <p className={cx(big, 'font-bold')}>
        {lesson.title} · step {lesson.step + 1} of {lesson.steps.length}
      </p>
      {s.notes && <p className={big}>{s.notes}</p>}
      {s.question && (
        <div className={big}>
          <p className="font-semibold">Q: {s.question}</p>
          {s.answer && (shown ? <p data-testid="lesson-answer">A: {s.answer}</p> : <button type="button" className="underline" onClick={() => setShown(true)}>Show the answer</button>)}
        </div>
      )}
      <div className={cx('flex gap-4 font-semibold underline', big)}>
        {lesson.step > 0 && <Link href={href(lesson.step - 1)}>← Previous step</Link>}
        {lesson.step < lesson.steps.length - 1 && <Link href={href(lesson.step + 1)} data-testid="lesson-next">Next step →</Link>}
      </div>
    </section>
  );
}
