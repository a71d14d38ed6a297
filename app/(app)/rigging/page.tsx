import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { may } from '@/lib/auth/permissions';
import { PageHeader } from '@/components/ui/page-header';
import { ExampleValuesNote } from '@/components/equipment/example-note';
import { RiggingTable } from '@/components/rigging/rigging-table';

export const metadata: Metadata = { title: 'Rigging' };

export default async function RiggingPage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const canEdit = may(user, 'manageRigging');
  return (
    <>
      <PageHeader eyebrow={user.organisationName} title="Rigging inventory" description="Slings, shackles, chain, blocks, hooks and straps, with their ratings and inspection dates. The scene editor offers in-service items only." />
      <div className="mb-5">
        <ExampleValuesNote />
      </div>
      <RiggingTable units={user.units} canEdit={canEdit} />
    </>
  );
}
