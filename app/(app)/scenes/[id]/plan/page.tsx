import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { getDb } from '@/db';
import { getScene } from '@/db/repositories/scenes';
import { planDetailsAt } from '@/db/repositories/plan-details';
import { getCurrentUser } from '@/lib/auth/current-user';
import { idParams } from '@/lib/api/route';
import { mayEditScene } from '@/lib/auth/permissions';
import { transition } from '@/lib/review/lifecycle';
import { PageHeader } from '@/components/ui/page-header';
import { Card, CardBody } from '@/components/ui/card';
import { PlanDetailsForm } from '@/components/scenes/plan-details-form';
import { PlanDownloadLink } from '@/components/scenes/plan-download-link';

export const metadata: Metadata = { title: 'Plan details' };

type Props = { params: Promise<{ id: string }> };

/** The plan details of a scene's latest revision: what the lift plan document needs beyond the sketch. */
export default async function PlanDetailsPage({ params }: Props) {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const db = getDb();
  const scene = await getScene(db, user, parsed.data.id);
  if (!scene) notFound();
  const stored = await planDetailsAt(db, scene.id, scene.revision);
  // The owner edits the details while the plan is editable; a submitted, approved or archived plan is frozen.
  const frozen = mayEditScene(user, scene) ? transition(scene.status, 'edit') : null;
  const canEdit = frozen?.ok === true;
  const readOnlyNote = frozen && !frozen.ok ? frozen.message : undefined;
  return (
    <>
      <p className="mb-3 flex flex-wrap gap-x-6">
        <Link href={`/scenes/${scene.id}/details`} className="inline-flex min-h-touch items-center font-semibold text-teal-dark underline-offset-4 hover:underline">
          ← Scene details
        </Link>
        <Link href={`/scenes/${scene.id}`} className="inline-flex min-h-touch items-center font-semibold text-teal-dark underline-offset-4 hover:underline">
          Open in editor
        </Link>
      </p>
      <PageHeader eyebrow="Plan details" title={scene.title} actions={<PlanDownloadLink sceneId={scene.id} />} />
      <Card>
        <CardBody>
          <p className="mb-4 text-body text-ink-muted">
            The job, the people, communication, site control, weather, hazards and the pre-lift checklist: everything the lift plan document carries that the sketch does not.
            {stored.savedAt ? ` Last saved with revision ${stored.savedAt} by ${stored.savedBy}.` : ' Not filled in yet.'}
          </p>
          <PlanDetailsForm sceneId={scene.id} revision={scene.revision} details={stored.details} units={user.units} canEdit={canEdit} readOnlyNote={readOnlyNote} />
        </CardBody>
      </Card>
    </>
  );
}
