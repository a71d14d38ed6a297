import { Text, View } from '@react-pdf/renderer';
import { dualLength, dualMass } from '@/lib/format/dual';
import type { PlanData } from './plan-data';
import { StabilityChart } from './stability-chart';
import { tippingLineLabel } from '@/lib/lift/names';
import { Table } from './table';
import { powerRuleWords } from '@/lib/format/checks';
import { ftToM } from '@/lib/units';
import { checkStatus, checkWords, deg, governingLineWords, pct } from './format';
import { s } from './styles';

/** Stability, clearances, power lines and every check in words: the server's figures for this revision. */
export function StabilitySection({ d }: { d: PlanData }) {
  const r = d.result;
  if (!r) return null;
  const u = d.meta.units;
  const limit = d.doc.limits.percentOfTipping;
  const w = r.worstCase;
  return (
    <View>
      {/* The heading keeps its first paragraph with it, never alone at the foot of a page. */}
      <View wrap={false}>
        <Text style={s.h2} minPresenceAhead={120}>Stability</Text>
        <Text style={s.p}>
          Worst case: {pct(w.percentOfTipping)} of tipping at slew {deg(w.slew)}, governing tipping line: {governingLineWords(r.checks, w.line)}. The plan’s limit is {limit} %
          {w.percentOfTipping <= limit ? `, a margin of ${(limit - w.percentOfTipping).toFixed(1)} points.` : `; ${(w.percentOfTipping - limit).toFixed(1)} points over it.`}
          {w.tippingLoad !== null ? ` A hook load of ${dualMass(w.tippingLoad, u)} would reach the tipping point there.` : ''}
        </Text>
      </View>
      {r.upperWeight && (
        <Text style={s.p}>
          At the upper weight ({dualMass(r.upperWeight.loadMass, u)}): {pct(r.upperWeight.worstCase.percentOfTipping)} at slew {deg(r.upperWeight.worstCase.slew)}, about {tippingLineLabel(r.upperWeight.worstCase.line)}.
        </Text>
      )}
      <View wrap={false}>
        <StabilityChart r={r} limit={limit} />
      </View>
      {r.lineChanges.length > 0 && <Text style={s.p}>The governing line changes {r.lineChanges.map((c) => `from ${tippingLineLabel(c.from)} to ${tippingLineLabel(c.to)} at ${deg(c.slew)}`).join('; ')}.</Text>}
    </View>
  );
}

export function ClearanceSection({ d }: { d: PlanData }) {
  const r = d.result;
  if (!r) return null;
  const u = d.meta.units;
  const limit = d.doc.limits.clearance;
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>Clearances</Text>
      <Text style={s.p}>Plan’s clearance limit: {dualLength(limit, u)} beside or above each part and obstacle.</Text>
      <Table
        columns={[{ title: 'Object', flex: 3 }, { title: 'Beside (plan gap)', flex: 2.5 }, { title: 'Above its top', flex: 2.5 }, { title: 'Nearest at slew', flex: 1.5 }, { title: 'Against limit', flex: 1.6 }]}
        rows={r.clearances.map((c) => [
          `${d.names[c.target] ?? (c.kind === 'body' ? 'a truck part' : 'an unnamed obstacle')} (${c.kind === 'body' ? 'truck' : 'site'})`,
          c.overlapsInPlan ? 'passes over it' : dualLength(c.horizontal, u),
          dualLength(c.vertical, u),
          deg(c.slew),
          c.horizontal >= limit || c.vertical >= limit ? 'within' : 'over',
        ])}
        tone={(i, j) => (j === 4 ? (r.clearances[i].horizontal >= limit || r.clearances[i].vertical >= limit ? 'within' : 'over') : null)}
      />
      <Text style={s.h3} minPresenceAhead={40}>Power lines</Text>
      {r.powerLines.length === 0 ? (
        <Text style={s.p}>No power lines are drawn on this plan.</Text>
      ) : (
        <Table
          columns={[{ title: 'Line', flex: 2.5 }, { title: 'Nearest approach', flex: 3 }, { title: 'Required distance', flex: 2.5 }, { title: 'Rule', flex: 4 }, { title: 'Against it', flex: 1.4 }]}
          rows={r.powerLines.map((p) => [
            d.names[p.id] ?? 'an unnamed power line',
            `${dualLength(p.distance, u)} (${p.nearest}, slew ${deg(p.slew)})`,
            p.required === null ? 'set by the utility' : dualLength(p.required, u),
            powerRuleWords(p.rule, p.rule.feet !== null ? dualLength(ftToM(p.rule.feet), u) : p.required !== null ? dualLength(p.required, u) : ''),
            p.required !== null && p.distance >= p.required ? 'within' : 'over',
          ])}
          tone={(i, j) => (j === 4 ? (r.powerLines[i].required !== null && r.powerLines[i].distance >= r.powerLines[i].required! ? 'within' : 'over') : null)}
        />
      )}
    </View>
  );
}

export function ChecksSection({ d }: { d: PlanData }) {
  const r = d.result;
  if (!r) return null;
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>Every check</Text>
      {r.checks.map((c) => (
        <View key={c.id} style={{ flexDirection: 'row', marginBottom: 2 }} wrap={false}>
          <Text style={[{ width: 62 }, c.ok ? s.within : s.over]}>{checkStatus(c)}</Text>
          <Text style={{ flex: 1 }}>{checkWords(c, d.meta.units)}</Text>
        </View>
      ))}
    </View>
  );
}
