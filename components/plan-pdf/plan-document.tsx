import { Document, Page, Text, View } from '@react-pdf/renderer';
import type { PlanData } from './plan-data';
import { DrawingSvg } from './drawing-svg';
import { PageFrame, planNumber } from './page-frame';
import { EquipmentSection, GroundSection, LoadSection, RiggingSection } from './sections-setup';
import { ChecksSection, ClearanceSection, StabilitySection } from './sections-checks';
import { DetailsSection, SignOffSection } from './sections-details';
import { WeightSection } from './section-weight';
import { governingLineWords, pct } from './format';
import { checksHeadline } from '@/lib/format/checks';
import { s } from './styles';

/** The lift plan document: the drawing first, then the set-up, the figures, the details and the sign-off. */
export function PlanDocument({ d }: { d: PlanData }) {
  const r = d.result;
  return (
    <Document title={`${d.meta.title}: lift plan ${planNumber(d.meta)} revision ${d.meta.revision}`} author={d.meta.organisation} creator="Arcline" producer="Arcline">
      <Page size="LETTER" style={s.page}>
        <Text style={s.h2}>Plan drawing</Text>
        {d.drawing ? (
          <View>
            <DrawingSvg d={d.drawing} />
            <View style={{ flexDirection: 'row', flexWrap: 'wrap', marginTop: 4 }}>
              {d.drawing.legend.map((l) => (
                <View key={l.label} style={{ flexDirection: 'row', alignItems: 'center', marginRight: 10, marginBottom: 2 }}>
                  <View style={{ width: 12, height: 6, marginRight: 3, backgroundColor: l.fill ?? '#FFFFFF', borderWidth: 1, borderColor: l.stroke ?? '#FFFFFF', borderStyle: l.dash ? 'dashed' : 'solid' }} />
                  <Text style={{ fontSize: 7 }}>{l.label}</Text>
                </View>
              ))}
            </View>
            {/* The drawing labels pads by their short codes; this says what each code is. */}
            {d.drawing.padKey && <Text style={{ fontSize: 7, marginTop: 2 }}>{d.drawing.padKey}</Text>}
          </View>
        ) : (
          <Text style={s.p}>No drawing: {d.problem ?? 'the sketch has nothing to compute yet'}.</Text>
        )}
        {r && (
          <Text style={[s.p, { marginTop: 4 }]}>
            Worst case {pct(r.worstCase.percentOfTipping)} of tipping at slew {r.worstCase.slew.toFixed(1)}° about the {governingLineWords(r.checks, r.worstCase.line)} (plan limit {d.doc.limits.percentOfTipping} %). {checksHeadline(r.checks)}.
          </Text>
        )}
        <View break>
          <EquipmentSection d={d} />
          <LoadSection d={d} />
          <RiggingSection d={d} />
          <GroundSection d={d} />
          <StabilitySection d={d} />
          <WeightSection d={d} />
          <ClearanceSection d={d} />
          <ChecksSection d={d} />
          <DetailsSection d={d} />
          <SignOffSection d={d} />
        </View>
        {/* Last, so the header, footer and DRAFT mark are painted over the drawing on every page. */}
        <PageFrame meta={d.meta} />
      </Page>
    </Document>
  );
}
