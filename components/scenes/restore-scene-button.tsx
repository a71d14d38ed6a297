'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { fetchJson } from '@/lib/client/fetch-json';
import { Button } from '@/components/ui/button';

/** Puts a deleted scene back in the list (POST /api/scenes/{id}/restore), then reloads the page. */
export function RestoreSceneButton({ sceneId, title }: { sceneId: number; title: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const restore = useMutation({
    mutationFn: () => fetchJson(`/api/scenes/${sceneId}/restore`, { method: 'POST' }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['scenes'] });
      router.refresh();
    },
  });
  return (
    <div className="flex flex-col items-end gap-1">
      <Button variant="secondary" disabled={restore.isPending} onClick={() => restore.mutate()} aria-label={`Restore ${title}`}>
        {restore.isPending ? 'Restoring…' : 'Restore'}
      </Button>
      {restore.isError && <p role="alert" className="text-caption text-over">{restore.error.message}</p>}
    </div>
  );
}
