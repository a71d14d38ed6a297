import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { getDb } from '@/db';
import { listEquipmentProfiles } from '@/db/repositories/equipment';
import { getCurrentUser } from '@/lib/auth/current-user';
import { PageHeader } from '@/components/ui/page-header';
import { ButtonLink } from '@/components/ui/button';
import { Badge } from '@/components/ui/badge';
import { EmptyState } from '@/components/ui/empty-state';
import { ExampleValuesNote } from '@/components/equipment/example-note';
import { truckSpecShape } from '@/lib/equipment/truck-spec';
import { formatLength, formatMass } from '@/lib/format/quantity';
import { may } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'Equipment' };

export default async function EquipmentPage({ searchParams }: { searchParams: Promise<{ retired?: string }> }) {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  const showRetired = (await searchParams).retired === '1';
  const profiles = await listEquipmentProfiles(getDb(), user.organisationId, { includeRetired: showRetired });
  const isAdmin = may(user, 'manageEquipment');
  return (
    <>
      <PageHeader
        eyebrow={user.organisationName}
        title="Truck profiles"
        description={isAdmin ? 'Each truck’s outline, boom, outriggers, winches and load chart. Every saved change keeps a new version.' : 'Each truck’s outline, boom, outriggers, winches and load chart. Admins edit profiles; you can read them.'}
        actions={
          isAdmin ? (
            <ButtonLink href="/equipment/new" variant="signal" size="lg">
              + New profile
            </ButtonLink>
          ) : undefined
        }
      />
      <div className="mb-5">
        <ExampleValuesNote />
      </div>
      <div className="mb-3 flex justify-end">
        <Link href={showRetired ? '/equipment' : '/equipment?retired=1'} className="inline-flex min-h-touch items-center px-2 font-semibold text-teal-dark underline underline-offset-4">
          {showRetired ? 'Hide retired profiles' : 'Show retired profiles'}
        </Link>
      </div>
      {profiles.length === 0 ? (
        <EmptyState title="No truck profiles yet">{isAdmin ? 'Create one from the truck’s own documents.' : 'An admin adds them.'}</EmptyState>
      ) : (
        <ul className="grid grid-cols-1 gap-4 md:grid-cols-2 2xl:grid-cols-3" aria-label="Truck profiles">
          {profiles.map((p) => {
            const s = truckSpecShape.safeParse(p.spec);
            const spec = s.success ? s.data : null;
            const rated = spec ? Math.max(...spec.loadChart.rated.flat().filter((v): v is number => v !== null)) : null;
            return (
              <li key={p.id} className="rounded-plate border border-paper-line bg-paper-raised p-4 shadow-plate">
                <div className="flex flex-wrap items-center justify-between gap-2">
                  <Link href={`/equipment/${p.id}`} className="text-heading font-semibold text-ink underline decoration-teal decoration-2 underline-offset-4 hover:text-teal">
                    {p.unitNumber ? `${p.unitNumber} · ` : ''}
                    {p.name}
                  </Link>
                  {p.retiredAt ? (
                    <Badge tone="neutral" glyph="box">Retired</Badge>
                  ) : p.inService ? (
                    <Badge tone="within" glyph="check">In service</Badge>
                  ) : (
                    <Badge tone="signal" glyph="clock">Out of service</Badge>
                  )}
                </div>
                <p className="mt-2 text-body text-ink-soft">
                  {spec ? `${formatLength(spec.carrier.length, user.units)} long · ${spec.outriggers.legs.length} legs · boom to ${formatLength(spec.boom.stages.at(-1)!.length, user.units)}${rated ? ` · chart top ${formatMass(rated, user.units)}` : ''}` : 'Spec needs review'}
                </p>
                <p className="mt-1 text-caption text-ink-muted">Version {p.version}</p>
              </li>
            );
          })}
        </ul>
      )}
    </>
  );
}
