import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { getDb } from '@/db';
import { findEquipmentProfile, findProfileVersion, listProfileVersions } from '@/db/repositories/equipment';
import { getCurrentUser } from '@/lib/auth/current-user';
import { idParams } from '@/lib/api/route';
import { pathId } from '@/lib/validations/path-id';
import { PageHeader } from '@/components/ui/page-header';
import { Notice } from '@/components/ui/notice';
import { Badge } from '@/components/ui/badge';
import { ExampleValuesNote } from '@/components/equipment/example-note';
import { ProfileForm, type ProfileFormValues } from '@/components/equipment/profile-form';
import { ProfileActions } from '@/components/equipment/profile-actions';
import { LocalTime } from '@/components/local-time';
import { may } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'Truck profile' };

export default async function ProfilePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ version?: string; created?: string }> }) {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const { id } = parsed.data;
  const sp = await searchParams;
  // ?version= names a stored version plainly ("2"); anything else is not a page.
  const version = sp.version === undefined ? null : pathId('version').safeParse(sp.version);
  if (version && !version.success) notFound();
  const db = getDb();
  const profile = await findEquipmentProfile(db, user.organisationId, id);
  if (!profile) notFound();
  const asked = version?.success ? version.data : null;
  const old = asked && asked !== profile.version ? await findProfileVersion(db, user.organisationId, id, asked) : null;
  if (asked && asked !== profile.version && !old) notFound();
  const versions = await listProfileVersions(db, user.organisationId, id);
  const isAdmin = may(user, 'manageEquipment');
  const readOnly = !isAdmin || !!old || !!profile.retiredAt;
  const shown = old ?? profile;
  const initial = { kind: 'truck', name: shown.name, unitNumber: shown.unitNumber ?? '', inService: shown.inService, spec: shown.spec } as ProfileFormValues;
  return (
    <>
      <PageHeader
        eyebrow={<Link href="/equipment">Truck profiles</Link>}
        title={`${shown.unitNumber ? `${shown.unitNumber} · ` : ''}${shown.name}`}
        description={old ? `Version ${old.version} of ${profile.version}, as saved. Scenes planned with this version load exactly these numbers.` : `Version ${profile.version}`}
        actions={isAdmin ? <ProfileActions id={profile.id} retired={!!profile.retiredAt} /> : undefined}
      />
      <div className="mb-5 space-y-3">
        <ExampleValuesNote />
        {sp.created && <Notice tone="success">Profile saved as version {profile.version}.</Notice>}
        {!isAdmin && <Notice tone="info" title="Read only">Admins edit truck profiles. You can read every figure and the drawing.</Notice>}
        {profile.retiredAt && <Notice tone="info" title="Retired">This profile is retired. Scenes planned with it still load it; duplicate it to make a new one.</Notice>}
        {old && (
          <Notice tone="info" title={`Viewing version ${old.version}`}>
            <Link href={`/equipment/${profile.id}`} className="font-semibold underline">
              Go to the current version ({profile.version})
            </Link>
          </Notice>
        )}
      </div>
      <ProfileForm key={old ? `v${old.version}` : "current"} initial={initial} units={user.units} readOnly={readOnly} profile={{ id: profile.id, version: profile.version }} />
      <section aria-labelledby="history-title" className="mt-8 rounded-plate border border-paper-line bg-paper-raised p-5 shadow-plate">
        <h2 id="history-title" className="text-heading">
          Version history
        </h2>
        <ol className="mt-3 divide-y divide-paper-line" data-testid="version-history">
          {versions.map((v) => (
            <li key={v.version} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span className="text-body">
                <Link href={v.version === profile.version ? `/equipment/${profile.id}` : `/equipment/${profile.id}?version=${v.version}`} className="font-semibold text-teal-dark underline underline-offset-4">
                  Version {v.version}
                </Link>{' '}
                · {v.authorName ?? 'seeded'} · <LocalTime iso={v.createdAt} />
              </span>
              {v.version === profile.version && <Badge tone="teal">Current</Badge>}
            </li>
          ))}
        </ol>
      </section>
    </>
  );
}
