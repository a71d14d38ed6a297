'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ROLES } from '@/lib/domain';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select';
import { ApiError, fetchJson } from '@/lib/client/fetch-json';
import { createUserSchema } from '@/lib/validations/users';
import { useLeaveGuard } from '@/components/use-leave-guard';

type Input = z.input<typeof createUserSchema>;
type Output = z.output<typeof createUserSchema>;
type Field = keyof Input;

export function CreateUserForm() {
  const queryClient = useQueryClient();
  const [created, setCreated] = useState<string | null>(null);
  const { register, handleSubmit, reset, setError, formState } = useForm<Input, unknown, Output>({
    resolver: zodResolver(createUserSchema),
    defaultValues: { name: '', email: '', role: 'operator', password: '' },
  });

  const create = useMutation({
    mutationFn: (body: Output) => fetchJson<{ name: string; email: string }>('/api/users', { method: 'POST', body: JSON.stringify(body) }),
    onSuccess: (u) => {
      setCreated(`${u.name} (${u.email}) can now sign in.`);
      reset();
      void queryClient.invalidateQueries({ queryKey: ['users'] });
    },
    onError: (err) => {
      if (err instanceof ApiError) {
        for (const i of err.body.issues ?? []) {
          if (['name', 'email', 'role', 'password'].includes(i.path)) setError(i.path as Field, { message: i.path === 'email' && err.status === 409 ? 'An account with this e-mail already exists' : i.message });
        }
      }
    },
  });

  useLeaveGuard(formState.isDirty && !create.isPending);
  const { errors } = formState;
  return (
    <form onSubmit={handleSubmit((v) => (setCreated(null), create.mutate(v)))} noValidate className="flex flex-col gap-4">
      {created && <Notice tone="success" title="User added">{created}</Notice>}
      {create.isError && !(create.error instanceof ApiError && create.error.body.issues?.length) && (
        <Notice tone="error" title="User not added">
          {create.error.message}
        </Notice>
      )}
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...register('email')} />
      <SelectField label="Role" error={errors.role?.message} {...register('role')}>
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {r[0].toUpperCase() + r.slice(1)}
          </option>
        ))}
      </SelectField>
      <TextField label="First password" type="password" autoComplete="new-password" hint="12 to 128 characters, not a commonly used password. Share it with them directly." error={errors.password?.message} {...register('password')} />
      <Button type="submit" variant="primary" disabled={create.isPending}>
        {create.isPending ? 'Adding…' : 'Add user'}
      </Button>
    </form>
  );
}
