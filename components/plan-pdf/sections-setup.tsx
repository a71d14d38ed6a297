import { Text, View } from '@react-pdf/renderer';
import { dualArea, dualLength, dualMass, dualPressure } from '@/lib/format/dual';
import { WEIGHT_SOURCE_WORDS } from '@/lib/plan-details/schema';
import { SOIL_CHOICES } from '@/lib/lift/soil';
import type { PlanData } from './plan-data';
import { KeyValues, Table } from './table';
import { checkWords, day, deg } from './format';
import { s } from './styles';
import { knownPadName } from '@/lib/lift/names';
import { kindLabel } from '@/components/rigging/labels';

/** Equipment configuration, load, rigging and ground: the set-up the figures rest on. */
export function EquipmentSection({ d }: { d: PlanData }) {
  const u = d.meta.units;
  const t = d.truck;
  if (!t) return <Text style={s.p}>No truck is placed on this plan.</Text>;
  const chartCheck = d.result?.checks.find((c) => c.code === 'load-chart' && !c.upperWeight);
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>Equipment configuration</Text>
      <KeyValues
        items={[
          ['Truck profile', `${d.truckName ?? 'Unknown profile'}${d.profile?.unitNumber ? `, unit ${d.profile.unitNumber}` : ''} (profile ${d.profile?.id ?? '-'}, version ${d.profile?.version ?? '-'})`],
          ['Boom', `${dualLength(t.boom.length, u)} long at ${deg(t.boom.elevation)} above horizontal`],
          ['Hook radius', d.result ? dualLength(d.result.hook.radius, u) : '-'],
          ['Swing', `From slew ${deg(d.doc.swing.from)} (pick) to ${deg(d.doc.swing.to)} (set), ${d.doc.swing.direction === 'ccw' ? 'counter-clockwise' : 'clockwise'} seen from above`],
          ['Winch', d.winches.length ? d.winches.map((w) => `${w.name}: rated line pull ${dualMass(w.ratedLinePull, u)}, up to ${w.maxParts} parts of line`).join('; ') : 'None in the profile'],
          ['Load chart use', chartCheck ? checkWords(chartCheck, u) : 'No load chart in the profile'],
        ]}
      />
      <Text style={s.h3} minPresenceAhead={40}>Outriggers</Text>
      <Table
        columns={[{ title: 'Leg', flex: 2 }, { title: 'Extension', flex: 3 }, { title: 'Cribbing or mat', flex: 4 }]}
        rows={Object.entries(t.legs).map(([id, leg]) => [knownPadName(id) ? `${id} (${knownPadName(id)})` : id, dualLength(leg.extension, u), leg.cribbing ? `${leg.cribbing.label || 'Cribbing'}: ${dualArea(leg.cribbing.area, u)}, ${dualMass(leg.cribbing.mass, u)}` : 'None'])}
      />
    </View>
  );
}

export function LoadSection({ d }: { d: PlanData }) {
  const u = d.meta.units;
  const l = d.load;
  if (!l) return <Text style={s.p}>No load is placed on this plan.</Text>;
  const shape = l.shape.kind === 'coil' ? `Coil, eye ${l.shape.eye}, ${dualLength(l.shape.outerDiameter, u)} across, ${dualLength(l.shape.width, u)} wide` : `${l.shape.kind === 'box' ? 'Box' : 'Vehicle'} ${dualLength(l.shape.length, u)} × ${dualLength(l.shape.width, u)} × ${dualLength(l.shape.height, u)}`;
  const info = d.details.load;
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>Load</Text>
      <KeyValues
        items={[
          ['Description', info.description || l.label || shape],
          ['Shape', shape],
          ['Weight used', `${dualMass(d.loadMassKg ?? 0, u)} (${l.massMode === 'estimate' ? `worked out from the dimensions at ${l.density} kg/m³` : 'entered'})`],
          ['How the weight is known', WEIGHT_SOURCE_WORDS[info.weightSource]],
          ['Figures behind it', info.weightBasis],
          ['Uncertainty allowed', `${l.weightUncertainty} %${d.result?.upperWeight ? `: the plan is also checked at ${dualMass(d.result.upperWeight.loadMass, u)}` : ''}`],
          ['Hook load', d.result ? `${dualMass(d.result.hook.hookLoad, u)} (load, block ${dualMass(l.blockMassKg, u)} and rigging)` : '-'],
          ['Centre of gravity', `${dualLength(l.cg.z, u)} above the load's bottom, offset ${dualLength(l.cg.x, u)} / ${dualLength(l.cg.y, u)}`],
          ['Attachment points', l.rigging.length ? l.rigging.map((r) => `${r.tag} (${r.legs} leg${r.legs > 1 ? 's' : ''}, ${r.hitch})`).join('; ') : 'No rigging picked'],
        ]}
      />
    </View>
  );
}

export function RiggingSection({ d }: { d: PlanData }) {
  const u = d.meta.units;
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>Rigging</Text>
      {d.rigging.length === 0 ? (
        <Text style={s.p}>No rigging is picked on this plan.</Text>
      ) : (
        <Table
          columns={[
            { title: 'Item', flex: 2 }, { title: 'Kind, hitch', flex: 3 }, { title: 'Sling angle', flex: 1.6 },
            { title: 'Rated for the hitch', flex: 3 }, { title: 'Utilisation', flex: 1.6, align: 'right' }, { title: 'Last inspection', flex: 2.2 },
          ]}
          rows={d.rigging.map((r) => [
            r.pick.tag,
            `${kindLabel(r.pick.kind)}, ${r.pick.legs} × ${r.pick.hitch}`,
            `${r.pick.angleFromHorizontal}° from horizontal`,
            r.capacityKg !== null ? dualMass(r.capacityKg, u) : dualMass(r.pick.ratingKg, u),
            r.demandKg !== null && r.capacityKg ? `${Math.round((100 * r.demandKg) / r.capacityKg)} %` : '-',
            r.lastInspection ? `${day(r.lastInspection, u)}${r.nextDue ? ` (next due ${day(r.nextDue, u)})` : ''}` : 'Not recorded',
          ])}
          tone={(i, j) => (j === 4 && d.rigging[i].demandKg !== null && d.rigging[i].capacityKg !== null ? (d.rigging[i].demandKg! > d.rigging[i].capacityKg! ? 'over' : null) : null)}
        />
      )}
    </View>
  );
}

export function GroundSection({ d }: { d: PlanData }) {
  const u = d.meta.units;
  const r = d.result;
  if (!r) return null;
  const soil = d.doc.soil;
  const choice = SOIL_CHOICES.find((c) => c.id === soil.preset);
  const source = choice ? `IBC Table 1806.2 presumptive value for ${choice.label.toLowerCase()}` : 'entered for this site';
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>Ground</Text>
      <Text style={s.p}>
        Allowable ground pressure {dualPressure(soil.allowable, u)}, {source}. Each support’s largest reaction over the swing:
      </Text>
      <Table
        columns={[
          { title: 'Support', flex: 1 }, { title: 'Largest reaction', flex: 3 }, { title: 'At slew', flex: 1.3 },
          { title: 'Bearing area', flex: 3 }, { title: 'Ground pressure', flex: 3 }, { title: 'Of allowable', flex: 1.6, align: 'right' },
        ]}
        rows={r.reactions.maxima.map((m) => {
          const a = d.padAreas[m.support];
          const area = a ? (a.cribbing ? `${dualArea(a.cribbing, u)} cribbing` : `${dualArea(a.pad, u)} pad`) : '-';
          return [m.support, `${dualMass(m.mass, u)} (${m.force.toFixed(1)} kN)`, deg(m.slew), area, dualPressure(m.pressure, u), `${Math.round((100 * m.pressure) / soil.allowable)} %`];
        })}
        tone={(i, j) => (j === 5 && r.reactions.maxima[i].pressure > soil.allowable ? 'over' : null)}
      />
    </View>
  );
}
