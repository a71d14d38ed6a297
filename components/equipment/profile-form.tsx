'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useLeaveGuard } from '@/components/use-leave-guard';
import { FormProvider, useForm, useWatch, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { equipmentProfileSchema } from '@/lib/validations/equipment';
import { ApiError, fetchJson } from '@/lib/client/fetch-json';
import type { UnitSystem } from '@/lib/units';
import { FormUnits, SectionState, collectIssues, pathIn } from './form-fields';
import { ProfileDrawing, type DraftSpec } from './profile-drawing';
import { BoomSection, CarrierSection, IdentitySection, LoadChartSection, OutriggersSection, UpperSection, WinchesSection } from './profile-sections';

export type ProfileFormValues = z.input<typeof equipmentProfileSchema>;

/** The form's sections, in order, with the field paths each holds. */
const SECTIONS = [
  ['identity', 'Identity', ['unitNumber', 'name', 'inService', 'spec.notes']],
  ['carrier', 'Carrier', ['spec.carrier']],
  ['upper', 'Upper', ['spec.upper']],
  ['boom', 'Boom', ['spec.boom']],
  ['outriggers', 'Outriggers', ['spec.outriggers']],
  ['winches', 'Winches', ['spec.winches']],
  ['load-chart', 'Load chart', ['spec.loadChart']],
] as const;
const PREFIXES: Record<string, readonly string[]> = Object.fromEntries(SECTIONS.map(([id, , prefixes]) => [id, prefixes]));
/** The sections holding these field paths. */
const sectionsOf = (paths: string[]) => SECTIONS.filter(([, , prefixes]) => paths.some((p) => pathIn(p, prefixes))).map(([id]) => id);

function LiveDrawing({ units }: { units: UnitSystem }) {
  const spec = useWatch<ProfileFormValues, 'spec'>({ name: 'spec' });
  return <ProfileDrawing spec={spec as DraftSpec} units={units} />;
}

interface Props {
  initial: ProfileFormValues;
  units: UnitSystem;
  readOnly: boolean;
  /** Editing an existing profile: its id and the version the edit starts from. */
  profile?: { id: number; version: number };
}

/** The truck profile form, in sections, with the to-scale drawing beside it updating as you type. */
export function ProfileForm({ initial, units, readOnly, profile }: Props) {
  const router = useRouter();
  const methods = useForm<ProfileFormValues>({ defaultValues: initial, resolver: zodResolver(equipmentProfileSchema) as Resolver<ProfileFormValues>, mode: 'onSubmit' });
  const [serverError, setServerError] = useState<string | null>(null);
  const [serverIssues, setServerIssues] = useState<{ path: string; message: string }[]>([]);
  const [saved, setSaved] = useState<string | null>(null);
  useLeaveGuard(!readOnly && methods.formState.isDirty && !methods.formState.isSubmitting);
  // The form is long: it opens on Identity alone, and a section opens by its heading, its link above, or
  // by holding a field that needs fixing after a save.
  const [open, setOpen] = useState<ReadonlySet<string>>(() => new Set(['identity']));
  const openSections = (ids: string[]) => setOpen((o) => new Set([...o, ...ids]));
  const sectionState = {
    isOpen: (id: string) => open.has(id),
    toggle: (id: string) => setOpen((o) => (o.has(id) ? new Set([...o].filter((x) => x !== id)) : new Set([...o, id]))),
    prefixes: PREFIXES,
  };

  const onSubmit = methods.handleSubmit(
    async (values) => {
      setServerError(null);
      setServerIssues([]);
      try {
        if (profile) {
          const p = await fetchJson<{ version: number }>(`/api/equipment/${profile.id}`, { method: 'PUT', body: JSON.stringify({ ...values, baseVersion: profile.version }) });
          setSaved(`Saved as version ${p.version}.`);
          methods.reset(values);
          // Fresh server data, and off ?created: the page's "created" notice is about version 1, not this save.
          router.replace(`/equipment/${profile.id}`);
        } else {
          const p = await fetchJson<{ id: number }>('/api/equipment', { method: 'POST', body: JSON.stringify(values) });
          methods.reset(values);
          router.push(`/equipment/${p.id}?created=1`);
        }
      } catch (e) {
        if (e instanceof ApiError) {
          setServerError(e.message);
          const issues = e.body.issues ?? [];
          setServerIssues(issues);
          for (const i of issues) methods.setError(i.path as never, { type: 'server', message: i.message });
          openSections(sectionsOf(issues.map((i) => i.path)));
        } else setServerError('Could not reach the server; your changes are still in the form.');
      }
    },
    (errors) => {
      setServerError('Some fields need attention; each is marked below, and their sections are open.');
      openSections(sectionsOf(collectIssues(errors, '').map((i) => i.path)));
    },
  );

  return (
    <FormUnits.Provider value={{ units, readOnly }}>
      <FormProvider {...methods}>
        <SectionState.Provider value={sectionState}>
          <form onSubmit={onSubmit} noValidate className="grid grid-cols-1 gap-6 xl:grid-cols-[minmax(0,1fr)_30rem]">
            <div className="order-2 min-w-0 space-y-5 xl:order-1">
              <nav aria-label="Profile sections" className="flex flex-wrap gap-2">
                {SECTIONS.map(([id, label]) => (
                  <a
                    key={id}
                    href={`#${id}`}
                    onClick={() => openSections([id])}
                    className="inline-flex min-h-touch items-center rounded-plate border border-paper-line bg-paper-raised px-3 text-label font-semibold text-teal-dark hover:bg-teal-light"
                  >
                    {label}
                  </a>
                ))}
                <button
                  type="button"
                  onClick={() => setOpen(open.size === SECTIONS.length ? new Set() : new Set(SECTIONS.map(([id]) => id)))}
                  className="inline-flex min-h-touch items-center rounded-plate border-2 border-ink bg-paper-raised px-3 text-label font-semibold text-ink hover:bg-paper-sunk"
                >
                  {open.size === SECTIONS.length ? 'Close all sections' : 'Open all sections'}
                </button>
              </nav>
              {/* Every control below honours readOnly itself, so the section headings stay usable when reading. */}
              <div className="min-w-0 space-y-5">
                <IdentitySection />
                <CarrierSection />
                <UpperSection />
                <BoomSection />
                <OutriggersSection />
                <WinchesSection />
                <LoadChartSection serverIssues={serverIssues} />
              </div>
            </div>
            <aside className="order-1 space-y-3 xl:sticky xl:top-4 xl:order-2 xl:self-start">
              <LiveDrawing units={units} />
              {serverError && (
                <Notice tone="error" title="Not saved">
                  {serverError}
                </Notice>
              )}
              {saved && !serverError && <Notice tone="success">{saved}</Notice>}
              {!readOnly && (
                <Button type="submit" variant="signal" size="lg" className="w-full" disabled={methods.formState.isSubmitting}>
                  {methods.formState.isSubmitting ? 'Saving…' : profile ? 'Save new version' : 'Create profile'}
                </Button>
              )}
            </aside>
          </form>
        </SectionState.Provider>
      </FormProvider>
    </FormUnits.Provider>
  );
}
