import type { Metadata } from 'next';
import { forbidden, redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { PageHeader } from '@/components/ui/page-header';
import { ExampleValuesNote } from '@/components/equipment/example-note';
import { ProfileForm } from '@/components/equipment/profile-form';
import { starterSpec } from '@/lib/equipment/starter-spec';
import { may } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'New truck profile' };

export default async function NewProfilePage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  if (!may(user, 'manageEquipment')) forbidden();
  return (
    <>
      <PageHeader eyebrow="Truck profiles" title="New truck profile" description="Start from the outline below and replace every figure with the truck’s own, from its manufacturer’s documents." />
      <div className="mb-5">
        <ExampleValuesNote />
      </div>
      <ProfileForm initial={{ kind: 'truck', name: '', unitNumber: '', inService: true, spec: starterSpec() }} units={user.units} readOnly={false} />
    </>
  );
}
