'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { EquipmentProfile } from '@/db/repositories/equipment';
import type { Scene } from '@/db/repositories/scenes';
import { Button, ButtonLink } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select';
import { ApiError, fetchJson } from '@/lib/client/fetch-json';
import { createSceneSchema } from '@/lib/validations/scenes';
import { useLeaveGuard } from '@/components/use-leave-guard';

// The form holds the truck choice as the select's string; it becomes the server schema's number|null on submit,
// and the result goes through the very schema the route handler uses.
const formSchema = z.object({ title: createSceneSchema.shape.title, truck: z.string() });
type FormValues = z.infer<typeof formSchema>;

type EquipmentSummary = Pick<EquipmentProfile, 'id' | 'name' | 'unitNumber' | 'inService'>;

export function NewSceneForm() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const trucks = useQuery({ queryKey: ['equipment'], queryFn: () => fetchJson<{ items: EquipmentSummary[] }>('/api/equipment') });
  const { register, handleSubmit, setError, formState } = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: { title: '', truck: '' } });

  const create = useMutation({
    mutationFn: (body: z.infer<typeof createSceneSchema>) => fetchJson<Scene>('/api/scenes', { method: 'POST', body: JSON.stringify(body) }),
    onSuccess: async (scene) => {
      await queryClient.invalidateQueries({ queryKey: ['scenes'] });
      // Straight into the editor: a new scene is made to be sketched.
      router.push(`/scenes/${scene.id}`);
    },
    onError: (err) => {
      // Field errors from the server land on the field they name.
      if (err instanceof ApiError) {
        for (const issue of err.body.issues ?? []) {
          if (issue.path === 'title') setError('title', { message: issue.message });
          if (issue.path === 'equipmentProfileId') setError('truck', { message: issue.message });
        }
      }
    },
  });

  useLeaveGuard(formState.isDirty && !create.isPending && !create.isSuccess);

  const onSubmit = handleSubmit((v) => {
    const body = createSceneSchema.parse({ title: v.title, equipmentProfileId: v.truck ? Number(v.truck) : null });
    create.mutate(body);
  });

  const { errors } = formState;
  const busy = create.isPending || create.isSuccess;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {create.isError && !(create.error instanceof ApiError && create.error.body.issues?.length) && (
        <Notice tone="error" title="The scene was not created">
          {create.error.message}
        </Notice>
      )}
      <TextField label="Title" placeholder="e.g. Rolled grain hauler, County Line bridge" hint="Where and what: crews find scenes by title." error={errors.title?.message} {...register('title')} />
      <SelectField
        label="Truck profile (optional)"
        hint={trucks.isError ? undefined : 'You can pick or change the truck later in the editor.'}
        error={errors.truck?.message ?? (trucks.isError ? 'Truck profiles could not be loaded; you can still create the scene.' : undefined)}
        disabled={trucks.isPending}
        {...register('truck')}
      >
        <option value="">{trucks.isPending ? 'Loading trucks…' : 'No truck yet'}</option>
        {trucks.data?.items
          .filter((t) => t.inService)
          .map((t) => (
            <option key={t.id} value={String(t.id)}>
              {t.unitNumber ? `${t.unitNumber} — ` : ''}
              {t.name}
            </option>
          ))}
      </SelectField>
      <div className="flex flex-wrap gap-3 pt-2">
        <Button type="submit" variant="signal" size="lg" disabled={busy}>
          {busy ? 'Creating…' : 'Create scene'}
        </Button>
        <ButtonLink href="/scenes" variant="secondary" size="lg">
          Cancel
        </ButtonLink>
      </div>
    </form>
  );
}
