import { StyleSheet } from '@react-pdf/renderer';
import { PDF_FONT } from './fonts';

/** Plan document styles: Letter paper, 36 pt margins, room at the top and bottom for the fixed header and footer. */
export const INK = '#15202B';
export const MUTED = '#5F6E7C';
export const RULE = '#CFC6B4';
export const OVER = '#B3261E';
export const WITHIN = '#1F6F3A';

export const s = StyleSheet.create({
  page: { fontFamily: PDF_FONT, fontSize: 8.5, color: INK, paddingTop: 70, paddingBottom: 66, paddingHorizontal: 36, lineHeight: 1.3 },
  header: { position: 'absolute', top: 22, left: 36, right: 36, borderBottomWidth: 1, borderBottomColor: INK, paddingBottom: 5, flexDirection: 'row', justifyContent: 'space-between' },
  headerTitle: { fontSize: 11, fontWeight: 700 },
  headerSmall: { fontSize: 7.5, color: MUTED },
  footer: { position: 'absolute', top: 738, left: 36, right: 36, borderTopWidth: 0.5, borderTopColor: RULE, paddingTop: 4, flexDirection: 'row', justifyContent: 'space-between' },
  caution: { fontSize: 6.8, color: MUTED, width: 440 },
  pageNo: { fontSize: 7.5, fontWeight: 600 },
  draft: { position: 'absolute', top: 330, left: 0, right: 0, textAlign: 'center', fontSize: 110, fontWeight: 700, color: OVER, opacity: 0.12, transform: 'rotate(-30deg)' },
  draftTag: { color: OVER, fontWeight: 700 },
  h2: { fontSize: 11, fontWeight: 700, marginTop: 12, marginBottom: 5 },
  h3: { fontSize: 9, fontWeight: 700, marginTop: 6, marginBottom: 3 },
  p: { marginBottom: 3 },
  muted: { color: MUTED },
  row: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2.5 },
  headRow: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: INK, paddingVertical: 2.5, fontWeight: 700 },
  cell: { paddingRight: 5 },
  kv: { flexDirection: 'row', marginBottom: 2 },
  kvKey: { width: 140, color: MUTED },
  kvVal: { flex: 1 },
  over: { color: OVER, fontWeight: 700 },
  within: { color: WITHIN },
  signLine: { flexDirection: 'row', borderBottomWidth: 0.8, borderBottomColor: INK, height: 22, alignItems: 'flex-end', marginBottom: 4 },
});
