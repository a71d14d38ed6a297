import type { Metadata } from 'next';
import Link from 'next/link';
import { getDb } from '@/db';
import { AuthFrame } from '@/components/auth/auth-frame';
import { ResetPasswordForm } from '@/components/auth/reset-password-form';
import { Notice } from '@/components/ui/notice';
import { resetTokenSchema } from '@/lib/validations/users';
import { usableReset } from '@/lib/server/password-reset';

export const metadata: Metadata = { title: 'Set a new password', referrer: 'no-referrer' };

/**
 * Opened from the e-mailed reset link. The token is checked here, on the server, so a dead link says so at
 * once instead of after the user has typed a new password twice.
 */
export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const raw = (await searchParams).token;
  const token = resetTokenSchema.safeParse(Array.isArray(raw) ? raw[0] : raw);
  const reset = token.success ? await usableReset(getDb(), token.data) : undefined;
  return (
    <AuthFrame eyebrow="Arcline password reset" tagline="Set a new password from the link your admin sent you.">
      <h1 className="text-title text-ink">Set a new password</h1>
      {reset && token.success ? (
        <>
          <p className="mt-1 text-body text-ink-muted">
            For <span className="font-semibold text-ink">{reset.name}</span> (<span className="[overflow-wrap:anywhere]">{reset.email}</span>). Setting it signs you out everywhere; then sign in with the new
            password.
          </p>
          <ResetPasswordForm token={token.data} />
        </>
      ) : (
        <div className="mt-4 flex flex-col gap-4">
          <Notice tone="error" title="This link no longer works">
            It has expired, has already been used, or was replaced by a newer e-mail. Ask your admin to send a new one.
          </Notice>
          <Link href="/sign-in" className="text-label font-semibold text-teal-dark underline">
            Go to sign-in
          </Link>
        </div>
      )}
    </AuthFrame>
  );
}
