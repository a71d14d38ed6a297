import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { PageHeader } from '@/components/ui/page-header';
import { ButtonLink } from '@/components/ui/button';
import { ScenesTable } from '@/components/scenes/scenes-table';
import { may } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'Scenes' };

const WHAT_YOU_SEE = {
  operator: 'Your own scenes, and the approved scenes of your organisation.',
  supervisor: 'Every scene in your organisation.',
  trainer: 'Every scene in your organisation, including the training set.',
  admin: 'Every scene in your organisation.',
} as const;

export default async function ScenesPage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const canCreate = may(user, 'createScene');
  const canRestore = may(user, 'restoreScene');
  return (
    <>
      <PageHeader
        eyebrow={user.organisationName}
        title="Scenes"
        description={WHAT_YOU_SEE[user.role]}
        actions={
          canCreate || canRestore ? (
            <div className="flex flex-wrap gap-3">
              {canRestore && (
                <ButtonLink href="/scenes/deleted" variant="secondary" size="lg">
                  Recently deleted
                </ButtonLink>
              )}
              {canCreate && (
                <ButtonLink href="/scenes/new" variant="signal" size="lg">
                  + New scene
                </ButtonLink>
              )}
            </div>
          ) : undefined
        }
      />
      <ScenesTable canCreate={canCreate} user={{ id: user.id, role: user.role }} units={user.units} />
    </>
  );
}
