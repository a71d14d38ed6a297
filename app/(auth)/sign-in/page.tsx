import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { Wordmark } from '@/components/logo';
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
    <div className="survey-grid flex min-h-screen flex-col">
      <header className="mx-auto w-full max-w-5xl px-6 py-5">
        <Link href="/" className="inline-block rounded-plate">
          <Wordmark />
        </Link>
      </header>
      <main className="flex flex-1 items-start justify-center px-6 pb-16 pt-4 md:items-center md:pt-0">
        <div className="grid w-full max-w-4xl overflow-hidden rounded-[14px] border-2 border-ink bg-paper-raised shadow-lift md:grid-cols-[1fr_1.15fr]">
          <div className="relative hidden flex-col justify-between bg-ink p-8 text-paper-raised md:flex">
            <div>
              <p className="text-caption font-bold uppercase tracking-[0.16em] text-signal">Arcline crew sign-in</p>
              <p className="mt-3 text-heading">Your organisation&rsquo;s scenes, trucks and rigging, in one place.</p>
            </div>
            <svg viewBox="0 0 200 120" aria-hidden className="mt-8 w-full">
              <path d="M20 110 A80 80 0 0 1 180 110" fill="none" stroke="#F2A900" strokeWidth="6" strokeLinecap="round" />
              <path d="M20 110 A80 80 0 0 1 180 110" fill="none" stroke="#15202B" strokeWidth="2" strokeDasharray="2 14" />
              <line x1="100" y1="110" x2="150" y2="50" stroke="#FFFFFF" strokeWidth="6" strokeLinecap="round" />
              <circle cx="150" cy="50" r="8" fill="#F2A900" />
              <circle cx="100" cy="110" r="7" fill="#3FA7AE" />
            </svg>
          </div>
          <div className="p-7 sm:p-10">
            <h1 className="text-title text-ink">Sign in</h1>
            <p className="mt-1 text-body text-ink-muted">Use the e-mail address your administrator set up for you.</p>
            {sp.signedOut && (
              <p role="status" className="mt-4 rounded-plate border-2 border-within bg-within-light px-3 py-2 text-label text-within">
                ✓ You are signed out.
              </p>
            )}
            <SignInForm next={next} />
          </div>
        </div>
      </main>
    </div>
  );
}
