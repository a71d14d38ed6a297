'use client';
import type { TruckObject } from '@/lib/scene/objects';
import { useEditorContext, useEditorState } from '../../editor-context';
import { moveTruckToProfileVersion } from '../../commands/truck';
import { updateObject } from '../../commands/objects';
import { maxExtension } from '@/lib/scene/truck/truck-model';
import { SelectField } from '../fields';
import { Bound } from './bound-field';
import { boomFields, legFields, legTitle } from './bound-fields';
import { Section } from './section';
import { formatLength } from '@/lib/format/quantity';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import { currentProfile, currentProfiles } from '@/lib/scene/truck/profile-versions';

/** Profile, boom and each leg's extension and cribbing. */
export function TruckInspector({ truck }: { truck: TruckObject }) {
  const { store } = useEditorContext();
  const model = useEditorState((s) => s.truck);
  const profiles = useEditorState((s) => s.profiles);
  const units = useEditorState((s) => s.units);
  const ro = useEditorState((s) => s.readOnly) || truck.locked;
  const run = store.getState().run;
  const options = currentProfiles(profiles);
  const current = currentProfile(profiles, truck.profileId);
  return (
    <>
      <Section title="Profile">
        <div className="col-span-2">
          <SelectField
            label="Truck"
            value={String(truck.profileId)}
            disabled={ro}
            options={options.map((p) => ({ value: String(p.id), label: `${p.unitNumber ?? ''} ${p.name} (v${p.id === truck.profileId ? truck.profileVersion : p.version})` }))}
            onCommit={(v) => {
              if (Number(v) === truck.profileId) return;
              const p = currentProfile(profiles, Number(v));
              if (!p) return;
              const m = truckModelFromProfile(p);
              const legs = Object.fromEntries(m.legs.map((l) => [l.id, { extension: maxExtension(l), cribbing: null }]));
              const length = Math.min(m.boom.maxLength, Math.max(m.boom.minLength, truck.boom.length));
              run(updateObject(truck.id, { profileId: p.id, profileVersion: p.version, legs, boom: { ...truck.boom, length } } as Partial<TruckObject>));
            }}
          />
          {current && current.version !== truck.profileVersion && (
            <div className="mt-2 rounded-md border border-signal-dark bg-signal-light p-2 text-sm" role="status" data-testid="profile-version-notice">
              <p>
                {model
                  ? `Planned with version ${truck.profileVersion}; the profile is now at version ${current.version}.`
                  : `Version ${truck.profileVersion} of this profile could not be found; the profile is now at version ${current.version}.`}{' '}
                The plan keeps the figures it was made with until you move it.
              </p>
              {!ro && (
                <button
                  type="button"
                  className="mt-2 min-h-11 rounded-md border border-teal bg-paper-raised px-3 text-sm font-semibold text-teal hover:bg-teal-light"
                  onClick={() => run(moveTruckToProfileVersion(truckModelFromProfile(current)))}
                >
                  Use version {current.version}
                </button>
              )}
            </div>
          )}
          {!model && !current && <p className="mt-1 text-xs text-over">This truck’s profile is not available to this scene; no analysis runs.</p>}
          {model?.exampleOutline && <p className="mt-1 text-xs text-over">This profile has no usable geometry; the outline shown is a generic example and no analysis runs.</p>}
        </div>
      </Section>
      <Section title="Boom">
        {boomFields(model, units).map((f) => (
          <Bound key={f.key} field={f} disabled={ro} />
        ))}
      </Section>
      {model && (
        <section className="mb-4">
          <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-muted">Outriggers and cribbing</h3>
          <div className="space-y-2">
            {model.legs.map((leg) => (
              <div key={leg.id} className="rounded-md border border-paper-line p-2" data-testid={`leg-${leg.id}`}>
                <div className="mb-1 flex items-baseline justify-between text-sm font-semibold">
                  <span>{legTitle(leg)}</span>
                  <span className="text-xs font-normal text-ink-muted">reaches 0 – {formatLength(maxExtension(leg), units)}</span>
                </div>
                <div className="grid grid-cols-3 gap-2">
                  {legFields(model, leg, units).map((f) => (
                    <Bound key={f.key} field={f} disabled={ro} />
                  ))}
                </div>
              </div>
            ))}
          </div>
        </section>
      )}
    </>
  );
}
