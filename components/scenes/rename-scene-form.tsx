'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { Scene } from '@/db/repositories/scenes';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError, fetchJson } from '@/lib/client/fetch-json';
import { sceneTitle, updateSceneSchema } from '@/lib/validations/scenes';
import { useLeaveGuard } from '@/components/use-leave-guard';

const formSchema = z.object({ title: sceneTitle });

interface Props {
  sceneId: number;
  title: string;
  /** The revision this page loaded: the save is based on it, and a newer one on the server means a conflict. */
  revision: number;
}

type Outcome = { kind: 'saved'; revision: number } | { kind: 'conflict'; current: number | null } | { kind: 'error'; message: string } | null;

export function RenameSceneForm({ sceneId, title, revision }: Props) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [base, setBase] = useState(revision);
  const [outcome, setOutcome] = useState<Outcome>(null);
  const { register, handleSubmit, reset, formState } = useForm({ resolver: zodResolver(formSchema), defaultValues: { title } });

  // A reload (router.refresh) brings new props: start again from what the server has now.
  const [seen, setSeen] = useState(revision);
  if (seen !== revision) {
    setSeen(revision);
    setBase(revision);
  }
  useEffect(() => reset({ title }), [revision, title, reset]);

  useLeaveGuard(formState.isDirty && !formState.isSubmitting);

  const save = useMutation({
    mutationFn: (body: z.infer<typeof updateSceneSchema>) => fetchJson<Scene>(`/api/scenes/${sceneId}`, { method: 'PUT', body: JSON.stringify(body) }),
    onSuccess: (scene) => {
      setBase(scene.revision);
      setOutcome({ kind: 'saved', revision: scene.revision });
      void queryClient.invalidateQueries({ queryKey: ['scenes'] });
      router.refresh();
    },
    onError: (err) => {
      if (err instanceof ApiError && err.status === 409) {
        const current = typeof err.body.currentRevision === 'number' ? err.body.currentRevision : null;
        setOutcome({ kind: 'conflict', current });
      } else setOutcome({ kind: 'error', message: err.message });
    },
  });

  const onSubmit = handleSubmit((v) => {
    setOutcome(null);
    save.mutate(updateSceneSchema.parse({ revision: base, title: v.title }));
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {outcome?.kind === 'conflict' && (
        <Notice
          tone="warning"
          title="Someone saved this scene after you opened it"
          actions={
            <Button
              variant="primary"
              onClick={() => {
                setOutcome(null);
                router.refresh();
              }}
            >
              Reload the latest version
            </Button>
          }
        >
          You opened revision {base}
          {outcome.current ? `; the scene is now at revision ${outcome.current}` : ''}. Your rename was not saved, and nothing of theirs was overwritten. Reload to see
          their changes, then rename again if you still need to.
        </Notice>
      )}
      {outcome?.kind === 'saved' && <Notice tone="success" title={`Saved as revision ${outcome.revision}`} />}
      {outcome?.kind === 'error' && (
        <Notice tone="error" title="Not saved">
          {outcome.message}
        </Notice>
      )}
      <div className="flex flex-wrap items-end gap-3">
        <TextField label="Scene title" frameClassName="min-w-[16rem] flex-1" error={formState.errors.title?.message} {...register('title')} />
        <Button type="submit" variant="primary" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : 'Save title'}
        </Button>
      </div>
      <p className="text-caption text-ink-muted">Saving makes a new revision; this page loaded revision {base}.</p>
    </form>
  );
}
