'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { passwordSchema } from '@/lib/auth/password-policy';
import { ApiError, fetchJson } from '@/lib/client/fetch-json';
import { useLeaveGuard } from '@/components/use-leave-guard';

const schema = z
  .object({ newPassword: passwordSchema, repeat: z.string() })
  .refine((v) => v.newPassword === v.repeat, { path: ['repeat'], message: 'The two passwords are not the same' });
type Values = z.infer<typeof schema>;

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const { register, handleSubmit, formState, setError } = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { newPassword: '', repeat: '' } });

  useLeaveGuard(formState.isDirty && !formState.isSubmitting && !done);

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await fetchJson('/api/password-reset', { method: 'POST', body: JSON.stringify({ token, newPassword: values.newPassword }) });
      setDone(true);
      router.replace('/sign-in?passwordSet=1');
    } catch (e) {
      const issue = e instanceof ApiError ? e.body.issues?.find((i) => i.path === 'newPassword') : undefined;
      if (issue) setError('newPassword', { message: issue.message });
      else setFailure(e instanceof Error ? e.message.replace(/^token: /, '') : 'The password was not set. Try again.');
    }
  });

  const { errors, isSubmitting } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 flex flex-col gap-5">
      {failure && (
        <Notice tone="error" title="The password was not set">
          {failure.charAt(0).toUpperCase() + failure.slice(1)}
        </Notice>
      )}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 12 characters; not a commonly used password."
        error={errors.newPassword?.message}
        {...register('newPassword')}
      />
      <TextField label="New password again" type="password" autoComplete="new-password" error={errors.repeat?.message} {...register('repeat')} />
      <Button type="submit" variant="primary" size="lg" disabled={isSubmitting} className="mt-1 w-full">
        {isSubmitting ? 'Setting the password…' : 'Set the new password'}
      </Button>
    </form>
  );
}
