import type { Metadata } from 'next';
import { forbidden, redirect } from 'next/navigation';
import { getCurrentUser } from '@/lib/auth/current-user';
import { may } from '@/lib/auth/permissions';
import { PageHeader } from '@/components/ui/page-header';
import { ExampleValuesNote } from '@/components/equipment/example-note';
import { RiggingItemForm } from '@/components/rigging/rigging-item-form';

export const metadata: Metadata = { title: 'New rigging item' };

export default async function NewRiggingPage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  if (!may(user, 'manageRigging')) forbidden();
  return (
    <>
      <PageHeader eyebrow="Rigging inventory" title="New rigging item" />
      <div className="mb-5">
        <ExampleValuesNote />
      </div>
      <RiggingItemForm
        units={user.units}
        readOnly={false}
        initial={{ tag: '', kind: 'round-sling', size: '', length: null, ratings: { vertical: null, choker: null, basket: null }, status: 'in_service', lastInspection: null, nextInspectionDue: null, notes: '' }}
      />
    </>
  );
}
