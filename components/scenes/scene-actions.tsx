'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { Who } from '@/lib/auth/permissions';
import { sceneActionsFor, type ActionScene, type SceneAction as Action } from '@/lib/scene/actions';
import { RESTORE_WINDOW_DAYS } from '@/lib/scene/retention';
import { fetchJson } from '@/lib/client/fetch-json';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { cx } from '@/components/ui/cx';

const LABEL: Record<Exclude<Action, 'training'>, string> = { duplicate: 'Duplicate', archive: 'Archive', unarchive: 'Unarchive', delete: 'Delete…' };

/**
 * Duplicate, archive, training set and delete for one scene. `layout="row"` is the list's compact menu;
 * `layout="bar"` the details page's buttons. Delete asks first and says an admin can restore it.
 */
export function SceneActions({ user, scene, layout, afterDelete = 'stay' }: { user: Who; scene: ActionScene; layout: 'row' | 'bar'; afterDelete?: 'list' | 'stay' }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const actions = sceneActionsFor(user, scene);

  const run = useMutation({
    mutationFn: async (a: Action): Promise<{ a: Action; id?: number }> => {
      const url = `/api/scenes/${scene.id}`;
      if (a === 'duplicate') return { a, id: (await fetchJson<{ id: number }>(`${url}/duplicate`, { method: 'POST', body: '{}' })).id };
      if (a === 'training') await fetchJson(`${url}/training`, { method: 'PUT', body: JSON.stringify({ inTrainingSet: !scene.inTrainingSet }) });
      else if (a === 'delete') await fetchJson(url, { method: 'DELETE' });
      else await fetchJson(`${url}/archive`, { method: 'PUT', body: JSON.stringify({ archived: a === 'archive' }) });
      return { a };
    },
    onSuccess: ({ a, id }) => {
      setError(null);
      setConfirming(false);
      void queryClient.invalidateQueries({ queryKey: ['scenes'] });
      if (a === 'duplicate' && id) router.push(`/scenes/${id}/details`);
      else if (a === 'delete' && afterDelete === 'list') router.push('/scenes');
      else router.refresh();
    },
    onError: (e) => setError(e.message),
  });

  if (actions.length === 0) return null;
  const size = layout === 'bar' ? 'lg' : 'md';
  const button = (a: Action) =>
    a === 'training' ? (
      <Button key={a} variant="secondary" size={size} disabled={run.isPending} aria-pressed={scene.inTrainingSet} onClick={() => run.mutate(a)}>
        {scene.inTrainingSet ? 'In training set ✓' : 'Add to training set'}
      </Button>
    ) : (
      <Button
        key={a}
        variant={a === 'delete' ? 'danger' : 'secondary'}
        size={size}
        disabled={run.isPending}
        onClick={() => (a === 'delete' ? setConfirming(true) : run.mutate(a))}
        aria-label={layout === 'row' ? `${LABEL[a].replace('…', '')} ${scene.title}` : undefined}
      >
        {LABEL[a]}
      </Button>
    );

  const body = (
    <>
      <div className={cx('flex gap-2', layout === 'row' ? 'flex-col items-stretch' : 'flex-wrap')}>{actions.map(button)}</div>
      {confirming && (
        <Notice
          tone="warning"
          title={`Delete “${scene.title}”?`}
          actions={
            <>
              <Button variant="danger" disabled={run.isPending} onClick={() => run.mutate('delete')}>
                Delete the scene
              </Button>
              <Button variant="secondary" onClick={() => setConfirming(false)}>
                Keep it
              </Button>
            </>
          }
        >
          It leaves the list for everyone. An admin can restore it for {RESTORE_WINDOW_DAYS} days.
        </Notice>
      )}
      {error && (
        <Notice tone="error" title="That did not work">
          {error}
        </Notice>
      )}
    </>
  );
  if (layout === 'bar') return <div className="flex flex-col gap-3" data-testid="scene-actions">{body}</div>;
  // In the list, one small menu per row keeps the table narrow enough for a tablet.
  return (
    <details className="group relative" data-testid="scene-row-actions">
      <summary
        aria-label={`Actions for ${scene.title}`}
        className="inline-flex min-h-touch cursor-pointer list-none items-center gap-1 rounded-plate px-2 font-semibold text-teal-dark hover:bg-teal-light [&::-webkit-details-marker]:hidden"
      >
        Actions <span aria-hidden className="transition-transform group-open:rotate-180">▾</span>
      </summary>
      <div className="absolute right-0 z-20 mt-1 flex w-72 flex-col gap-2 rounded-plate border-2 border-ink bg-paper-raised p-3 shadow-lg">{body}</div>
    </details>
  );
}
