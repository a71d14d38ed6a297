'use client';
import { useCallback, useState } from 'react';
import { errorText, sendJson } from '@/components/review/post-json';
import type { CommentView, ThreadView } from '@/lib/review/page-data';

export type { CommentView, ThreadView };
export type Anchor = { x: number; y: number } | { objectId: string };

/** The scene's comment threads, kept in step with the server after every post, reply, resolve or reopen. */
export function useComments(sceneId: number, initial: ThreadView[]) {
  const [threads, setThreads] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const refresh = useCallback(async () => {
    const res = await fetch(`/api/scenes/${sceneId}/comments`, { cache: 'no-store' }).catch(() => null);
    if (res?.ok) setThreads(((await res.json()) as { items: ThreadView[] }).items);
  }, [sceneId]);
  const run = useCallback(
    async (method: 'POST' | 'PATCH', url: string, body: unknown) => {
      setBusy(true);
      setError(null);
      const r = await sendJson(method, url, body);
      if (!r.ok) setError(errorText(r.json));
      else await refresh();
      setBusy(false);
      return r.ok;
    },
    [refresh],
  );
  return {
    threads,
    error,
    busy,
    refresh,
    post: (body: string, anchor: Anchor | null, parentId?: number) =>
      run('POST', `/api/scenes/${sceneId}/comments`, { body, ...(anchor ? { anchor } : {}), ...(parentId ? { parentId } : {}) }),
    setResolved: (commentId: number, resolved: boolean) => run('PATCH', `/api/scenes/${sceneId}/comments/${commentId}`, { resolved }),
  };
}

export type Comments = ReturnType<typeof useComments>;
