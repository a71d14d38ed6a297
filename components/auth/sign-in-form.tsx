'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';

const schema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail address').email('That does not look like an e-mail address'),
  password: z.string().min(1, 'Enter your password'),
});
type Values = z.infer<typeof schema>;

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { email: '', password: '' } });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const res = await signIn('credentials', { email: values.email, password: values.password, redirect: false });
    if (!res || res.error || !res.ok) {
      setFailure(
        res?.error === 'TooManyAttempts'
          ? 'Too many wrong passwords for this account. Wait a minute, then try again.'
          : res?.error === 'CredentialsSignin' || !res
            ? 'That e-mail and password do not match an active account. Check both and try again.'
            : 'Sign-in failed. Try again in a moment.',
      );
      return;
    }
    router.replace(next);
    router.refresh();
  });

  const { errors, isSubmitting } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 flex flex-col gap-5">
      {failure && (
        <Notice tone="error" title="Could not sign you in">
          {failure}
        </Notice>
      )}
      <TextField label="E-mail" type="email" autoComplete="username" inputMode="email" error={errors.email?.message} {...register('email')} />
      <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register('password')} />
      <Button type="submit" variant="primary" size="lg" disabled={isSubmitting} className="mt-1 w-full">
        {isSubmitting ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
