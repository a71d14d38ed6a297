'use client';
import { useCallback, useEffect, useRef, useState } from 'react';
import type { AdvisorPhase, AdvisorResult } from '@/lib/advisor/types';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';
import type { AdvisorWorkerReply } from './advisor-messages';

export type AdvisorRun =
  | { status: 'idle' }
  | { status: 'running'; phase: AdvisorPhase; fraction: number }
  | { status: 'done'; result: AdvisorResult; document: SceneDocument }
  | { status: 'error'; message: string }
  | { status: 'cancelled' };

/** Runs the advisor in a Web Worker; cancel terminates it. */
export function useAdvisor() {
  const [run, setRun] = useState<AdvisorRun>({ status: 'idle' });
  const worker = useRef<Worker | null>(null);

  const stop = useCallback(() => {
    worker.current?.terminate();
    worker.current = null;
  }, []);

  const start = useCallback(
    (document: SceneDocument, profile: TruckProfileInput) => {
      stop();
      const w = new Worker(new URL('./advisor-worker.ts', import.meta.url), { type: 'module' });
      worker.current = w;
      setRun({ status: 'running', phase: 'grid', fraction: 0 });
      w.onmessage = (e: MessageEvent<AdvisorWorkerReply>) => {
        const m = e.data;
        if (m.type === 'progress') setRun({ status: 'running', phase: m.phase, fraction: m.fraction });
        else {
          setRun(m.type === 'done' ? { status: 'done', result: m.result, document } : { status: 'error', message: m.message });
          stop();
        }
      };
      w.onerror = () => {
        setRun({ status: 'error', message: 'The search could not run in this browser.' });
        stop();
      };
      w.postMessage({ document, profile });
    },
    [stop],
  );

  const cancel = useCallback(() => {
    stop();
    setRun({ status: 'cancelled' });
  }, [stop]);

  useEffect(() => stop, [stop]);
  return { run, start, cancel, reset: () => setRun({ status: 'idle' }) };
}
