'use client';
import { wrap360 } from '@/lib/angles';
import type { TruckObject } from '@/lib/scene/objects';
import { useEditorContext, useEditorState } from '../../editor-context';
import { moveTruckToProfileVersion, setBoom, setLegCribbing, setLegExtension } from '../../commands/truck';
import { updateObject } from '../../commands/objects';
import { maxExtension } from '@/lib/scene/truck/truck-model';
import { LengthField, NumberField, SelectField } from '../fields';
import { Section } from './section';
import { ft2ToM2, kgToLb, lbToKg, m2ToFt2 } from '@/lib/units';
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
  const metric = units === 'metric';
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
        <NumberField label="Slew (° from cab, CCW)" value={truck.boom.slew} suffix="°" min={-360} max={720} disabled={ro} onCommit={(slew) => run(setBoom({ slew: wrap360(slew) }))} testId="field-slew" />
        <NumberField label="Elevation" value={truck.boom.elevation} suffix="°" min={model?.boom.minElevation ?? -10} max={model?.boom.maxElevation ?? 89} disabled={ro} onCommit={(elevation) => run(setBoom({ elevation }))} testId="field-elevation" />
        <LengthField label={`Length (${model ? `${formatLength(model.boom.minLength, units)}–${formatLength(model.boom.maxLength, units)}` : ''})`} value={truck.boom.length} units={units} disabled={ro} onCommit={(length) => run(setBoom({ length: model ? Math.min(model.boom.maxLength, Math.max(model.boom.minLength, length)) : length }))} testId="field-boom-length" />
      </Section>
      {model && (
        <section className="mb-4">
          <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-muted">Outriggers and cribbing</h3>
          <div className="space-y-2">
            {model.legs.map((leg) => {
              const s = truck.legs[leg.id] ?? { extension: 0, cribbing: null };
              return (
                <div key={leg.id} className="rounded-md border border-paper-line p-2" data-testid={`leg-${leg.id}`}>
                  <div className="mb-1 flex items-baseline justify-between text-sm font-semibold">
                    <span>Leg {leg.id}</span>
                    <span className="text-xs font-normal text-ink-muted">out 0 – {formatLength(maxExtension(leg), units)}</span>
                  </div>
                  <div className="grid grid-cols-3 gap-2">
                    <LengthField label="Extension" value={s.extension} units={units} min={0} disabled={ro} onCommit={(v) => run(setLegExtension(leg.id, Math.min(v, maxExtension(leg)), 'commit'))} testId={`ext-${leg.id}`} />
                    <NumberField
                      label={`Cribbing (${metric ? 'm²' : 'ft²'})`}
                      value={s.cribbing ? (metric ? s.cribbing.area : m2ToFt2(s.cribbing.area)) : 0}
                      min={0}
                      digits={metric ? 2 : 1}
                      disabled={ro}
                      testId={`crib-${leg.id}`}
                      onCommit={(v) => run(setLegCribbing(leg.id, v > 0 ? { area: metric ? v : ft2ToM2(v), mass: s.cribbing?.mass ?? 0, label: s.cribbing?.label ?? '' } : null))}
                    />
                    <NumberField
                      label={`Crib mass (${metric ? 'kg' : 'lb'})`}
                      value={s.cribbing ? (metric ? s.cribbing.mass : kgToLb(s.cribbing.mass)) : 0}
                      min={0}
                      digits={0}
                      disabled={ro || !s.cribbing}
                      onCommit={(v) => s.cribbing && run(setLegCribbing(leg.id, { ...s.cribbing, mass: metric ? v : lbToKg(v) }))}
                    />
                  </div>
                </div>
              );
            })}
          </div>
        </section>
      )}
    </>
  );
}
