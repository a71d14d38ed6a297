import { Text, View } from '@react-pdf/renderer';
import { CAUTION_TEXT } from '@/lib/caution';
import type { PlanMeta } from './plan-data';
import { s } from './styles';

export const planNumber = (m: Pick<PlanMeta, 'sceneId'>) => `AL-${String(m.sceneId).padStart(5, '0')}`;

/** Header, DRAFT mark, caution and page numbers: fixed, so they repeat on every page. */
export function PageFrame({ meta }: { meta: PlanMeta }) {
  const status = meta.approved ? 'Approved' : `DRAFT (${meta.status}, not approved)`;
  return (
    <>
      {!meta.approved && (
        <Text style={s.draft} fixed>
          DRAFT
        </Text>
      )}
      <View style={s.header} fixed>
        <View style={{ width: 340 }}>
          <Text style={s.headerSmall}>{meta.organisation} · Lift plan</Text>
          <Text style={s.headerTitle}>{meta.title}</Text>
        </View>
        <View style={{ alignItems: 'flex-end' }}>
          <Text style={s.headerSmall}>
            Plan {planNumber(meta)} · Revision {meta.revision}
            {meta.revision !== meta.latestRevision ? ` of ${meta.latestRevision}` : ''}
          </Text>
          <Text style={meta.approved ? { fontWeight: 700 } : s.draftTag}>Status: {status}</Text>
        </View>
      </View>
      <View style={s.footer} fixed>
        <Text style={s.caution}>Caution: {CAUTION_TEXT}</Text>
        <Text style={s.pageNo} render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
    </>
  );
}
