import { Text, View } from '@react-pdf/renderer';
import { s } from './styles';

/**
 * A table that flows across pages: each row keeps together, the header row repeats at the top of every
 * page the table reaches (a fixed element inside the table's view), and long cell text wraps in its column.
 */
export interface Column {
  title: string;
  /** Share of the width (flex). */
  flex: number;
  align?: 'left' | 'right';
}

export function Table({ columns, rows, tone }: { columns: Column[]; rows: string[][]; tone?: (row: number, col: number) => 'over' | 'within' | null }) {
  return (
    <View>
      <View style={s.headRow} fixed>
        {columns.map((c) => (
          <Text key={c.title} style={[s.cell, { flex: c.flex, textAlign: c.align ?? 'left' }]}>
            {c.title}
          </Text>
        ))}
      </View>
      {rows.map((r, i) => (
        <View key={i} style={s.row} wrap={false}>
          {r.map((v, j) => {
            const t = tone?.(i, j);
            return (
              <Text key={j} style={[s.cell, { flex: columns[j].flex, textAlign: columns[j].align ?? 'left' }, ...(t ? [s[t]] : [])]}>
                {v}
              </Text>
            );
          })}
        </View>
      ))}
    </View>
  );
}

export function KeyValues({ items }: { items: [string, string][] }) {
  return (
    <View>
      {items.map(([k, v]) => (
        <View key={k} style={s.kv} wrap={false}>
          <Text style={s.kvKey}>{k}</Text>
          <Text style={s.kvVal}>{v || '-'}</Text>
        </View>
      ))}
    </View>
  );
}
