'use client';
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { useLeaveGuard } from '@/components/use-leave-guard';

export interface TrainingScene {
  id: number;
  title: string;
  latest: number;
}
interface StepDraft {
  sceneId: number;
  revision: number;
  notes: string;
  question: string;
  answer: string;
}
export interface LessonDraft {
  id?: number;
  title: string;
  steps: StepDraft[];
}

const input = 'min-h-touch w-full rounded-plate border-2 border-ink bg-paper-raised px-2';

/** Builds or edits a lesson: a title and ordered steps, each a training-set scene at a chosen revision. */
export function LessonForm({ scenes, initial }: { scenes: TrainingScene[]; initial?: LessonDraft }) {
  const router = useRouter();
  const blank = (): StepDraft => ({ sceneId: scenes[0]?.id ?? 0, revision: scenes[0]?.latest ?? 1, notes: '', question: '', answer: '' });
  const [title, setTitle] = useState(initial?.title ?? '');
  const [steps, setSteps] = useState<StepDraft[]>(initial?.steps ?? [blank()]);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  // Dirty while the title or steps differ from what the page opened with; not after a save has begun.
  const [opened] = useState(() => JSON.stringify({ title, steps }));
  const [leaving, setLeaving] = useState(false);
  useLeaveGuard(!leaving && JSON.stringify({ title, steps }) !== opened);
  const edit = (i: number, patch: Partial<StepDraft>) => setSteps(steps.map((s, k) => (k === i ? { ...s, ...patch } : s)));
  const move = (i: number, d: -1 | 1) => {
    const next = [...steps];
    [next[i], next[i + d]] = [next[i + d], next[i]];
    setSteps(next);
  };
  if (scenes.length === 0) return <p className="text-ink-muted">The training set is empty. Add scenes to it from a scene’s details page first.</p>;
  return (
    <form
      className="grid gap-4"
      data-testid="lesson-form"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        setError(null);
        const body = {
          title,
          steps: steps.map((s) => ({ sceneId: s.sceneId, revision: s.revision, notes: s.notes, ...(s.question.trim() ? { question: s.question } : {}), ...(s.question.trim() && s.answer.trim() ? { answer: s.answer } : {}) })),
        };
        const res = await fetch(initial?.id ? `/api/lessons/${initial.id}` : '/api/lessons', { method: initial?.id ? 'PUT' : 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
        const json = await res.json().catch(() => ({}));
        setBusy(false);
        if (!res.ok) return setError(json.error ?? `Could not save (${res.status})`);
        setLeaving(true);
        router.push(`/lessons/${json.id}`);
        router.refresh();
      }}
    >
      <label className="grid gap-1 font-semibold">
        Lesson title
        <input className={input} value={title} onChange={(e) => setTitle(e.target.value)} required minLength={3} maxLength={120} name="title" />
      </label>
      <ol className="grid gap-3">
        {steps.map((s, i) => {
          const scene = scenes.find((x) => x.id === s.sceneId);
          return (
            <li key={i} className="grid gap-2 rounded-plate border-2 border-paper-line bg-paper-raised p-3" data-testid="lesson-step-form">
              <div className="flex flex-wrap items-end gap-2">
                <span className="font-bold">Step {i + 1}</span>
                <label className="grid flex-1 gap-1 text-sm">
                  Scene
                  <select className={input} value={s.sceneId} aria-label={`Step ${i + 1} scene`} onChange={(e) => { const sc = scenes.find((x) => x.id === Number(e.target.value)); edit(i, { sceneId: Number(e.target.value), revision: sc?.latest ?? 1 }); }}>
                    {scenes.map((sc) => <option key={sc.id} value={sc.id}>{sc.title}</option>)}
                  </select>
                </label>
                <label className="grid w-28 gap-1 text-sm">
                  Revision
                  <input className={input} type="number" min={1} max={scene?.latest ?? 1} value={s.revision} aria-label={`Step ${i + 1} revision`} onChange={(e) => edit(i, { revision: Number(e.target.value) })} />
                </label>
                <button type="button" className="min-h-touch px-2 underline" disabled={i === 0} onClick={() => move(i, -1)}>Up</button>
                <button type="button" className="min-h-touch px-2 underline" disabled={i === steps.length - 1} onClick={() => move(i, 1)}>Down</button>
                <button type="button" className="min-h-touch px-2 text-over underline" disabled={steps.length === 1} onClick={() => setSteps(steps.filter((_, k) => k !== i))}>Remove</button>
              </div>
              <label className="grid gap-1 text-sm">Talking notes<textarea className={input} rows={2} value={s.notes} aria-label={`Step ${i + 1} notes`} onChange={(e) => edit(i, { notes: e.target.value })} /></label>
              <div className="grid gap-2 sm:grid-cols-2">
                <label className="grid gap-1 text-sm">Question (optional)<input className={input} value={s.question} aria-label={`Step ${i + 1} question`} onChange={(e) => edit(i, { question: e.target.value })} /></label>
                <label className="grid gap-1 text-sm">Answer (optional)<input className={input} value={s.answer} aria-label={`Step ${i + 1} answer`} onChange={(e) => edit(i, { answer: e.target.value })} /></label>
              </div>
            </li>
          );
        })}
      </ol>
      <div className="flex flex-wrap gap-3">
        <button type="button" className="min-h-touch rounded-plate border-2 border-ink bg-paper-raised px-4 font-semibold" onClick={() => setSteps([...steps, blank()])}>+ Add a step</button>
        <button type="submit" className="min-h-touch rounded-plate border-2 border-ink bg-signal px-4 font-semibold" disabled={busy}>{initial?.id ? 'Save lesson' : 'Create lesson'}</button>
      </div>
      {error && <p role="alert" className="text-over">{error}</p>}
    </form>
  );
}
