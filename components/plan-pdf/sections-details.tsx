import { Text, View } from '@react-pdf/renderer';
import { dualSpeed } from '@/lib/format/dual';
import type { PlanData } from './plan-data';
import { KeyValues, Table } from './table';
import { localWhen, when, yesNo } from './format';
import { s } from './styles';

/** The plan details (item 1 of the plan document) and the sign-off. */
export function DetailsSection({ d }: { d: PlanData }) {
  const x = d.details;
  const u = d.meta.units;
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>Job and site</Text>
      <KeyValues
        items={[
          ['Customer', x.job.customer],
          ['Reference', x.job.reference],
          ['Location', x.job.location],
          ['Date and time', localWhen(x.job.when)],
          ['Lift director', x.people.liftDirector],
          ['Operator', x.people.operator],
          ['Spotter', x.people.spotter],
          ['Signal person', x.people.signalPerson],
          ['Communication', [x.communication.handSignals ? 'Hand signals' : '', x.communication.radioChannel ? `radio ${x.communication.radioChannel}` : ''].filter(Boolean).join(', ')],
          ['Communication notes', x.communication.notes],
          ['Traffic control', x.siteControl.traffic],
          ['Lane closed', x.siteControl.laneClosed],
          ['Police on scene', yesNo(x.siteControl.policeOnScene)],
          ['Weather', x.weather.conditions],
          ['Wind limit', x.weather.windLimit === null ? '' : `Stop above ${dualSpeed(x.weather.windLimit, u)}`],
        ]}
      />
      <Text style={s.h3} minPresenceAhead={40}>Hazards and their controls</Text>
      {x.hazards.length ? (
        <Table columns={[{ title: 'Hazard', flex: 1 }, { title: 'Control', flex: 1 }]} rows={x.hazards.map((h) => [h.hazard, h.control])} />
      ) : (
        <Text style={s.p}>None recorded.</Text>
      )}
      <Text style={s.h3} minPresenceAhead={40}>Contingency</Text>
      <Text style={s.p}>{x.contingency || 'None recorded.'}</Text>
      <Text style={s.h3} minPresenceAhead={40}>Emergency action plan</Text>
      <Text style={s.p}>{x.emergencyPlan || 'None recorded.'}</Text>
      <Text style={s.h3} minPresenceAhead={40}>Pre-lift checklist</Text>
      {x.checklist.map((c, i) => (
        <View key={i} style={{ flexDirection: 'row', marginBottom: 2 }} wrap={false}>
          <Text style={{ width: 16 }}>{c.done ? '[x]' : '[  ]'}</Text>
          <Text style={{ flex: 1 }}>{c.item}</Text>
        </View>
      ))}
    </View>
  );
}

function SignLine({ role, name, extra }: { role: string; name: string; extra?: string }) {
  return (
    <View style={s.signLine} wrap={false}>
      <Text style={{ width: 110, color: '#5F6E7C' }}>{role}</Text>
      <Text style={{ width: 150 }}>{name}</Text>
      <Text style={{ flex: 1, color: '#5F6E7C' }}>{extra ?? 'Signature'}</Text>
      <Text style={{ width: 90, color: '#5F6E7C' }}>Date / time</Text>
    </View>
  );
}

export function SignOffSection({ d }: { d: PlanData }) {
  const p = d.details.people;
  // Not kept on one page: conditions and reasons may run long, and must wrap onto the next page.
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>Sign-off</Text>
      <Text style={s.p}>
        Prepared by {d.meta.savedBy}, revision {d.meta.revision} saved {when(d.meta.savedAt, d.meta.units)}.
      </Text>
      {d.signOff.length ? (
        d.signOff.map((o, i) => (
          <View key={i} style={{ marginBottom: 4 }}>
            <Text style={s.p}>
              {o.action} by {o.by}
              {o.role ? ` (${o.role})` : ''}, {when(o.at, d.meta.units)}.
            </Text>
            {o.conditions ? <Text style={s.p}>Conditions: {o.conditions}</Text> : null}
            {o.reason ? <Text style={s.p}>Reason for approval beyond the plan’s own limits: {o.reason}</Text> : null}
          </View>
        ))
      ) : (
        <>
          <Text style={[s.p, s.muted]}>No review is recorded for this revision.</Text>
          <SignLine role="Reviewed / approved by" name="" extra="Signature and conditions" />
        </>
      )}
      <Text style={s.h3} minPresenceAhead={40}>Crew briefed on this plan</Text>
      <SignLine role="Lift director" name={p.liftDirector} />
      <SignLine role="Operator" name={p.operator} />
      <SignLine role="Spotter" name={p.spotter} />
      <SignLine role="Signal person" name={p.signalPerson} />
      <SignLine role="Crew" name="" />
      <SignLine role="Crew" name="" />
    </View>
  );
}
