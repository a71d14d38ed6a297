import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { getDb } from '@/db';
import { findRiggingItem, listInspections } from '@/db/repositories/rigging';
import { getCurrentUser } from '@/lib/auth/current-user';
import { may } from '@/lib/auth/permissions';
import { idParams } from '@/lib/api/route';
import { today } from '@/lib/dates';
import { PageHeader } from '@/components/ui/page-header';
import { LocalDay } from '@/components/local-time';
import { Notice } from '@/components/ui/notice';
import { ExampleValuesNote } from '@/components/equipment/example-note';
import { RiggingItemForm } from '@/components/rigging/rigging-item-form';
import { InspectionsPanel } from '@/components/rigging/inspections-panel';
import { KIND_LABEL, dueState } from '@/components/rigging/labels';

export const metadata: Metadata = { title: 'Rigging item' };

export default async function RiggingItemPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ saved?: string }> }) {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const { id } = parsed.data;
  const db = getDb();
  const item = await findRiggingItem(db, user.organisationId, id);
  if (!item) notFound();
  const inspections = await listInspections(db, user.organisationId, id);
  const canEdit = may(user, 'manageRigging');
  const due = dueState(item.nextInspectionDue, today());
  return (
    <>
      <PageHeader eyebrow={<Link href="/rigging">Rigging inventory</Link>} title={`${item.tag} · ${KIND_LABEL[item.kind]}`} description={item.size || undefined} />
      <div className="mb-5 space-y-3">
        <ExampleValuesNote />
        {(await searchParams).saved && <Notice tone="success">Item saved.</Notice>}
        {item.notForLifting && (
          <Notice tone="error" title="Not lifting rigging">
            {item.notForLifting} The stored figures are kept as they were; the editor will not add this item to a lift plan.
          </Notice>
        )}
        {item.status === 'tagged_out' && <Notice tone="error" title="Tagged out">The editor refuses this item until it is back in service.</Notice>}
        {due === 'overdue' && <Notice tone="warning" title="Inspection overdue">It was due on <LocalDay ymd={item.nextInspectionDue!} />. The editor warns when this item is picked.</Notice>}
      </div>
      <div className="grid grid-cols-1 gap-6 xl:grid-cols-[minmax(0,1fr)_28rem]">
        <RiggingItemForm id={item.id} units={user.units} readOnly={!canEdit} initial={{ tag: item.tag, kind: item.kind, size: item.size, length: item.length, ratings: item.ratings, status: item.status, lastInspection: item.lastInspection, nextInspectionDue: item.nextInspectionDue, notes: item.notes }} />
        <InspectionsPanel itemId={item.id} items={inspections} canRecord={canEdit && item.status !== 'retired'} today={today()} />
      </div>
    </>
  );
}
