import { ButtonLink } from '@/components/ui/button';
import { roleLabel } from '@/components/shell/app-shell';
import { getCurrentUser, type CurrentUser } from '@/lib/auth/current-user';
import { redirect } from 'next/navigation';

/** The 403 page body: says what is missing and who can help, instead of an unexplained blank. */
export function Forbidden({ user, needs }: { user: CurrentUser; needs: string }) {
  return (
    <div className="mx-auto mt-8 max-w-xl rounded-plate border-2 border-ink bg-paper-raised p-8 shadow-plate">
      <p className="text-caption font-bold uppercase tracking-[0.14em] text-over">403 · Not available for your role</p>
      <h1 className="mt-2 text-title text-ink">This page is for {needs}</h1>
      <p className="mt-3 text-body text-ink-soft">
        You are signed in as <strong>{user.name}</strong>, {roleLabel(user.role).toLowerCase()} at {user.organisationName}. Ask an administrator in your
        organisation if you need access.
      </p>
      <ButtonLink href="/scenes" variant="secondary" className="mt-6">
        Back to scenes
      </ButtonLink>
    </div>
  );
}

/**
 * For a route's forbidden.tsx (which gets no props): the page called forbidden(), so Next answers 403 and
 * renders this inside the signed-in shell.
 */
export async function ForbiddenForRole({ needs }: { needs: string }) {
  const user = await getCurrentUser();
  // The signed-in shell has already sent anyone signed out to sign in.
  if (!user) redirect('/sign-in');
  return <Forbidden user={user} needs={needs} />;
}
