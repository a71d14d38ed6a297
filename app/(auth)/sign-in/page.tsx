import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { AuthFrame } from '@/components/auth/auth-frame';
import { SignInForm } from '@/components/auth/sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

/**
 * Only same-site paths: an open redirect through callbackUrl would send people off-site after sign-in.
 * The proxy sends an absolute callbackUrl on our own origin (NEXTAUTH_URL); anything else goes to /scenes.
 */
function safeNext(raw: string | string[] | undefined): string {
  const v = Array.isArray(raw) ? raw[0] : raw;
  if (!v) return '/scenes';
  try {
    const base = new URL(process.env.NEXTAUTH_URL ?? 'http://arcline.local');
    const url = new URL(v, base);
    if (url.origin !== base.origin || url.pathname.startsWith('/sign-in')) return '/scenes';
    return url.pathname + url.search;
  } catch {
    return '/scenes';
  }
}

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const sp = await searchParams;
  const next = safeNext(sp.callbackUrl);
  if (await getCurrentUser()) redirect(next);
  return (
    <AuthFrame eyebrow="Arcline crew sign-in" tagline="Your organisation’s scenes, trucks and rigging, in one place.">
      <h1 className="text-title text-ink">Sign in</h1>
      <p className="mt-1 text-body text-ink-muted">Use the e-mail address your administrator set up for you.</p>
      {sp.signedOut && (
        <p role="status" className="mt-4 rounded-plate border-2 border-within bg-within-light px-3 py-2 text-label text-within">
          ✓ You are signed out.
        </p>
      )}
      {sp.passwordSet && (
        <p role="status" className="mt-4 rounded-plate border-2 border-within bg-within-light px-3 py-2 text-label text-within">
          ✓ Your new password is set. Sign in with it.
        </p>
      )}
      <SignInForm next={next} />
    </AuthFrame>
  );
}
