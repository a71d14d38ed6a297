import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { getDb } from '@/db';
import { getScene, listRevisions } from '@/db/repositories/scenes';
import { listSceneAudit } from '@/db/repositories/audit';
import { findEquipmentProfile } from '@/db/repositories/equipment';
import { getCurrentUser } from '@/lib/auth/current-user';
import { idParams } from '@/lib/api/route';
import { PageHeader } from '@/components/ui/page-header';
import { Card, CardBody, CardHeader, FactList } from '@/components/ui/card';
import { Badge, StatusPill } from '@/components/ui/badge';
import { ButtonLink } from '@/components/ui/button';
import { LocalTime } from '@/components/local-time';
import { RenameSceneForm } from '@/components/scenes/rename-scene-form';
import { AuditTimeline } from '@/components/scenes/audit-timeline';
import { SceneActions } from '@/components/scenes/scene-actions';
import { sceneActionsFor } from '@/lib/scene/actions';
import { PlanSummary } from '@/components/scenes/plan-summary';
import { loadPlanData } from '@/app/api/scenes/[id]/load-plan';
import { PlanDownloadLink } from '@/components/scenes/plan-download-link';
import { mayEditScene } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'Scene details' };

type Props = { params: Promise<{ id: string }> };

export default async function SceneDetailsPage({ params }: Props) {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const db = getDb();
  // getScene is scoped to the user's organisation and role: another org's id, or an operator's look at a
  // colleague's draft, is simply not found.
  const scene = await getScene(db, user, parsed.data.id);
  if (!scene) notFound();
  const [revisions, audit, truck] = await Promise.all([
    listRevisions(db, user.organisationId, scene.id),
    listSceneAudit(db, user.organisationId, scene.id),
    scene.equipmentProfileId ? findEquipmentProfile(db, user.organisationId, scene.equipmentProfileId) : undefined,
  ]);
  const canRename = mayEditScene(user, scene);
  // The plan as the server computes its latest revision: the PDF's own data, drawing included.
  const plan = await loadPlanData(db, user, scene.id, scene.revision).catch(() => null);
  const actionsNote = (rename: boolean, owner: string) =>
    rename ? 'Rename, copy, archive or delete this scene.' : sceneActionsFor(user, scene).length ? `Only the owner, ${owner}, can rename this scene.` : `Only the owner, ${owner}, or an admin can change this scene.`;

  return (
    <>
      <p className="mb-3">
        <Link href="/scenes" className="inline-flex min-h-touch items-center font-semibold text-teal-dark underline-offset-4 hover:underline">
          ← All scenes
        </Link>
      </p>
      <PageHeader
        eyebrow="Scene details"
        title={<span data-testid="scene-title">{scene.title}</span>}
        actions={
          <div className="flex flex-wrap gap-3">
            <ButtonLink href={`/scenes/${scene.id}`} variant="signal" size="lg">
              Open in editor
            </ButtonLink>
            {scene.status !== 'draft' && (
              <ButtonLink href={`/scenes/${scene.id}/review`} variant="secondary" size="lg">
                {scene.status === 'submitted' && user.role !== 'operator' && user.role !== 'trainer' ? 'Review and decide' : 'Review page'}
              </ButtonLink>
            )}
            <ButtonLink href={`/scenes/${scene.id}/replay`} variant="secondary" size="lg">
              Replay
            </ButtonLink>
            <ButtonLink href={`/scenes/${scene.id}/plan`} variant="secondary" size="lg">
              Plan details
            </ButtonLink>
            <PlanDownloadLink sceneId={scene.id} size="lg" />
          </div>
        }
      />
      <div className="grid gap-6 xl:grid-cols-[1fr_1fr]">
        <Card className="xl:col-span-2">
          <CardHeader title="The plan" description={`Revision ${scene.revision}, as the server computes it`} />
          <CardBody>
            <PlanSummary revision={scene.revision} title={scene.title} units={user.units} result={plan?.result ?? null} problem={plan ? plan.problem : 'The saved sketch could not be read.'} drawing={plan?.drawing ?? null} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Summary" />
          <CardBody>
            <FactList
              items={[
                { label: 'Status', value: <StatusPill status={scene.status} /> },
                { label: 'Owner', value: scene.ownerName },
                { label: 'Revision', value: <span data-testid="scene-revision">{scene.revision}</span> },
                { label: 'Last saved', value: <LocalTime iso={scene.updatedAt} /> },
                { label: 'Created', value: <LocalTime iso={scene.createdAt} /> },
                {
                  label: 'Truck profile',
                  value: truck
                    ? `${truck.unitNumber ? `${truck.unitNumber} — ` : ''}${truck.name} · profile version ${scene.equipmentProfileVersion ?? "?"}`
                    : 'None chosen yet',
                },
                { label: 'Training set', value: scene.inTrainingSet ? <Badge tone="teal" glyph="check">In the training set</Badge> : 'No' },
              ]}
            />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Actions" description={actionsNote(canRename, scene.ownerName)} />
          <CardBody className="flex flex-col gap-5">
            {canRename && <RenameSceneForm sceneId={scene.id} title={scene.title} revision={scene.revision} />}
            <SceneActions user={{ id: user.id, role: user.role }} scene={{ id: scene.id, title: scene.title, status: scene.status, ownerId: scene.ownerId, inTrainingSet: scene.inTrainingSet }} layout="bar" afterDelete="list" />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Revision history" description={`${revisions.length} ${revisions.length === 1 ? 'revision' : 'revisions'}, newest first`} />
          <ol className="divide-y divide-paper-line" data-testid="revision-history">
            {revisions.map((r) => (
              <li key={r.revision} className="flex flex-wrap items-center justify-between gap-2 px-5 py-3">
                <span className="font-semibold">Revision {r.revision}</span>
                <span className="text-ink-soft">
                  {r.author_name} · <LocalTime iso={r.created_at} />
                </span>
              </li>
            ))}
          </ol>
        </Card>
        <AuditTimeline audit={audit} />
      </div>
    </>
  );
}
