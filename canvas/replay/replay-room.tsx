'use client';
import { useEffect, useState } from 'react';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useStore } from 'zustand';
import { createEditorStore } from '../store/editor-store';
import { createEditor } from '../editor/create-editor';
import { EditorContext } from '../editor-context';
import { attachLiveAnalysis } from '../analysis/live-analysis';
import { useAutoFit } from '../view/use-auto-fit';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';
import type { UnitSystem } from '@/lib/units';
import type { RevisionSummary } from '@/lib/replay/headline-figures';
import { SPEED_KEYS, profileSlewRate, DEFAULT_SLEW_DEG_PER_S } from '@/lib/replay/playback-clock';
import { CautionNote } from '@/components/caution-note';
import { cx } from '@/components/ui/cx';
import { ReplayPlan } from './replay-plan';
import { FiguresPanel } from './figures-panel';
import { TippingChart } from './tipping-chart';
import { ReplayControls } from './replay-controls';
import { RevisionTimeline, CompareTable } from './revision-timeline';
import { WhatIfPanel } from './what-if-panel';
import { LessonBar, type LessonStepView } from './lesson-bar';
import { applyWhatIf, type WhatIf } from './what-if';
import { usePlayback, type Playback } from './use-playback';
import { useSaveTrainingCopy } from './save-training-copy';

export interface ReplayRoomProps {
  scene: { id: number; title: string; status: string; latest: number; inTrainingSet: boolean };
  revision: number;
  document: SceneDocument;
  compare: { revision: number; document: SceneDocument } | null;
  profiles: TruckProfileInput[];
  revisions: RevisionSummary[];
  present: boolean;
  units: UnitSystem;
  canSaveTraining: boolean;
  lesson: { id: number; title: string; steps: LessonStepView[]; step: number } | null;
}

declare global {
  interface Window {
    /** For tests and the bench: the replay's store and clock. */
    __arclineReplay?: { store: ReturnType<typeof createEditorStore>; playback: Playback };
  }
}

const typing = (t: EventTarget | null) => t instanceof HTMLElement && (t.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(t.tagName));

export function ReplayRoom(props: ReplayRoomProps) {
  const router = useRouter();
  const make = (doc: SceneDocument, revision: number) => {
    const store = createEditorStore({ sceneId: props.scene.id, document: doc, revision, readOnly: true, units: props.units, profiles: props.profiles });
    return { store, editor: createEditor(store) };
  };
  const [ctx] = useState(() => make(props.document, props.revision));
  const [ghost] = useState(() => (props.compare ? make(props.compare.document, props.compare.revision) : null));
  const rate = profileSlewRate(props.profiles.find((p) => p.id === ctx.store.getState().truck?.profileId && p.version === ctx.store.getState().truck?.profileVersion)?.spec) ?? DEFAULT_SLEW_DEG_PER_S;
  const playback = usePlayback(ctx.store, rate);
  useAutoFit(ctx);
  const [hidden, setHidden] = useState(false);
  const [sandbox, setSandbox] = useState(false);
  const [whatIf, setWhatIf] = useState<WhatIf>({});
  const analysis = useStore(ctx.store, (s) => s.analysis);
  const doc = useStore(ctx.store, (s) => s.document);
  const save = useSaveTrainingCopy(props.scene.id, () => ctx.store.getState().document);
  const base = `/scenes/${props.scene.id}/replay?revision=${props.revision}${props.compare ? `&compare=${props.compare.revision}` : ''}`;
  const lessonQuery = props.lesson ? `&lesson=${props.lesson.id}&step=${props.lesson.step}` : '';

  useEffect(() => {
    const detach = attachLiveAnalysis(ctx.store, { deferFull: (run) => setTimeout(run, 0) });
    window.__arclineReplay = { store: ctx.store, playback };
    return detach;
  }, [ctx]); // eslint-disable-line react-hooks/exhaustive-deps
  useEffect(() => {
    window.__arclineReplay = { store: ctx.store, playback };
  });

  // The sandbox edits a copy in this page; leaving it puts the saved revision back.
  useEffect(() => {
    ctx.store.getState().set({ document: sandbox ? applyWhatIf(props.document, whatIf) : props.document });
  }, [sandbox, whatIf, ctx, props.document]);

  useEffect(() => {
    const down = (e: KeyboardEvent) => {
      if (typing(e.target) || e.ctrlKey || e.metaKey || e.altKey) return;
      const k = e.key;
      if (k === ' ') playback.toggle();
      else if (k === 'ArrowLeft') playback.step(-1);
      else if (k === 'ArrowRight') playback.step(1);
      else if (k === 'w' || k === 'W') playback.worst();
      else if (SPEED_KEYS[k]) playback.setSpeed(SPEED_KEYS[k]);
      else if (k === 'f' || k === 'F') {
        if (document.fullscreenElement) void document.exitFullscreen();
        else void document.documentElement.requestFullscreen?.().catch(() => undefined);
      } else if (k === 'Escape' && props.present) router.push(base + lessonQuery.replace(/&step=\d+/, ''));
      else return;
      e.preventDefault();
    };
    window.addEventListener('keydown', down);
    return () => window.removeEventListener('keydown', down);
  }, [playback, props.present, router, base, lessonQuery]);

  const result = analysis?.result ?? null;
  const before = props.compare ? props.revisions.find((r) => r.revision === props.compare!.revision) : undefined;
  const after = props.revisions.find((r) => r.revision === props.revision);
  const chart = result && (
    <TippingChart sweep={result.sweep} arc={playback.clock.arc} travel={playback.clock.travel} limit={doc.limits.percentOfTipping} worstSlew={hidden ? null : result.worstCase.slew} dark={props.present} />
  );

  if (props.present) {
    return (
      <EditorContext.Provider value={ctx}>
        <div className="flex h-full flex-col bg-[#0B1218] text-[#F7F4EE]" data-testid="presenter">
          <div className="flex min-h-0 flex-1">
            <div className="relative min-w-0 flex-[3] bg-paper">
              <ReplayPlan ghost={ghost} hideResults={hidden} />
            </div>
            <aside className="flex w-[40%] max-w-[760px] flex-col gap-4 overflow-y-auto p-6">
              <h1 className="text-[30px] font-bold leading-tight">
                {props.scene.title} <span className="font-normal opacity-80">· revision {props.revision}</span>
              </h1>
              {props.lesson && <LessonBar lesson={props.lesson} present />}
              <FiguresPanel big hidden={hidden} />
              {!hidden && <div className="shrink-0">{chart}</div>}
              <label className="flex items-center gap-3 text-[24px] font-semibold">
                <input type="checkbox" className="h-7 w-7 accent-[#F2A900]" checked={hidden} onChange={(e) => setHidden(e.target.checked)} data-testid="hide-results" />
                Hide results
              </label>
              <p className="text-[20px] opacity-80">
                Space play/pause · ← → one degree · W worst case · 1–4 speed ({playback.clock.speed}×) · F full screen · Esc leave
              </p>
            </aside>
          </div>
          <CautionNote compact className="rounded-none border-x-0 border-b-0 text-[20px] [&_p]:text-[20px]" />
        </div>
      </EditorContext.Provider>
    );
  }

  return (
    <EditorContext.Provider value={ctx}>
      <div className="flex h-full flex-col">
        <header className="flex flex-wrap items-center gap-x-4 gap-y-1 border-b-2 border-ink bg-paper-raised px-4 py-2">
          <Link href={props.lesson ? `/lessons/${props.lesson.id}` : `/scenes/${props.scene.id}/details`} className="text-sm font-semibold text-teal-dark underline">
            ← {props.lesson ? 'Lesson' : 'Scene details'}
          </Link>
          <h1 className="text-lg font-bold">Replay: {props.scene.title}</h1>
          <span className="text-sm text-ink-soft" data-testid="replay-revision">
            Revision {props.revision}
            {props.revision !== props.scene.latest ? ` (latest is ${props.scene.latest})` : ' (latest)'}
            {props.compare ? ` · compared with revision ${props.compare.revision}` : ''}
          </span>
          <span className="flex-1" />
          <button type="button" className={cx('min-h-touch rounded-plate border-2 px-3 font-semibold', sandbox ? 'border-signal bg-signal' : 'border-ink bg-paper-raised')} onClick={() => setSandbox(!sandbox)} aria-pressed={sandbox}>
            {sandbox ? 'Leave what-if' : 'What-if'}
          </button>
          <Link href={`${base}&present=1${lessonQuery}`} className="inline-flex min-h-touch items-center rounded-plate border-2 border-ink bg-ink px-3 font-semibold text-paper-raised">
            Present
          </Link>
        </header>
        <div className="flex min-h-0 flex-1">
          <div className="flex min-w-0 flex-1 flex-col">
            <div className="relative min-h-0 flex-1">
              <ReplayPlan ghost={ghost} />
              {sandbox && <p className="absolute left-3 top-3 rounded-plate border-2 border-ink bg-signal px-3 py-1 font-bold">What-if sandbox: not the saved plan</p>}
            </div>
            <div className="border-t border-paper-line bg-paper-raised px-3 py-2">
              <ReplayControls playback={playback} rate={rate} canWorst={!!result} />
            </div>
          </div>
          <aside className="flex w-[380px] shrink-0 flex-col gap-3 overflow-y-auto border-l-2 border-ink bg-paper p-3">
            {props.lesson && <LessonBar lesson={props.lesson} present={false} />}
            <FiguresPanel />
            <div className="shrink-0">{chart}</div>
            {sandbox && (
              <WhatIfPanel original={props.document} whatIf={whatIf} onChange={setWhatIf} units={props.units} onSave={props.canSaveTraining ? save.save : null} saveState={save.state} />
            )}
            {before && after && <CompareTable before={before} after={after} units={props.units} />}
            <h2 className="mt-1 text-sm font-bold uppercase tracking-wide">Revisions</h2>
            <RevisionTimeline sceneId={props.scene.id} revisions={props.revisions} shown={props.revision} compare={props.compare?.revision ?? null} units={props.units} />
            <CautionNote compact />
          </aside>
        </div>
      </div>
    </EditorContext.Provider>
  );
}
