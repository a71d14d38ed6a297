import { Text, View } from '@react-pdf/renderer';
import { CAUTION_LINES } from '@/lib/caution';
import { dualMass, dualPressure } from '@/lib/format/dual';
import { bandWords, changeWords, limitsInOrder, sensitivityHeadline, weightLimitFigure, weightLimitTitle } from '@/lib/format/weight-sensitivity';
import type { PlanData } from './plan-data';
import { pct } from './format';
import { Table } from './table';
import { s } from './styles';

/** Weight sensitivity: the weight at which each limit is reached, and the figures across the weight band. */
export function WeightSection({ d }: { d: PlanData }) {
  const ws = d.result?.weightSensitivity;
  if (!ws) return null;
  const u = d.meta.units;
  const mass = (kg: number) => dualMass(kg, u);
  const ends = ws.curve.length > 1 ? [ws.curve[0], ws.curve.find((c) => c.change === 0) ?? ws.curve[0], ws.curve[ws.curve.length - 1]] : ws.curve;
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={120}>If the load weighs more</Text>
      <Text style={[s.p, { fontWeight: 700 }]}>{sensitivityHeadline(ws, mass)}</Text>
      <Text style={s.p}>{CAUTION_LINES[0]} {CAUTION_LINES[1]}</Text>
      <Text style={s.p}>Weights looked at: {bandWords(ws, mass)}</Text>
      <Table
        columns={[{ title: 'Load weight', flex: 3 }, { title: 'Worst % of tipping', flex: 2, align: 'right' }, { title: 'Load chart use', flex: 2, align: 'right' }, { title: 'Highest pad pressure', flex: 3, align: 'right' }]}
        rows={ends.map((c) => [`${mass(c.loadMass)} (${c.change === 0 ? 'planned' : changeWords(c.change)})`, pct(c.percentOfTipping), pct(c.loadChartPercent), `${dualPressure(c.padPressure, u)} (${c.pad})`])}
      />
      <Text style={s.h3} minPresenceAhead={40}>Weight at which each limit is reached</Text>
      <Table
        columns={[{ title: 'Limit', flex: 5 }, { title: 'Reached at', flex: 4 }]}
        rows={limitsInOrder(ws).map((l) => [weightLimitTitle(l).replace(/^./, (c) => c.toUpperCase()), weightLimitFigure(l, mass)])}
      />
    </View>
  );
}
