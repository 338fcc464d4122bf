// Native: the bigraded Khovanov table, i across and j down (largest j on top), the j labels in a
// column that stays while the groups scroll sideways; each column as wide as its longest
// group (KhTable.web.tsx is the web's HTML table).
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import type { KhGroupJson } from '@/shared/api/runs';
import { grid, groupText } from '@/shared/khovanov/format';
import { colors, fonts, space, type } from '@/constants/theme';
import { TeX } from '@/components/ui/Math';

/** Monospace digits and letters are about this wide at the table's sizes. */
const CHAR = { compact: 7, full: 9 };

export function KhTable({ groups, ring, compact = false, label }: { groups: KhGroupJson[]; ring: string; compact?: boolean; label: string; focusable?: boolean }) {
  const g = grid(groups);
  if (g.is.length === 0) return <Text style={styles.muted}>All groups are zero.</Text>;
  const cell = compact ? styles.cellCompact : styles.cell;
  const width = (i: number) => Math.max(compact ? 24 : 36, 12 + (compact ? CHAR.compact : CHAR.full) * Math.max(String(i).length, ...g.js.map((j) => { const x = g.at(i, j); return x ? groupText(x, ring).length : 0; })));
  const labelWidth = { width: Math.max(compact ? 24 : 36, 12 + 9 * Math.max(...g.js.map((j) => String(j).length))) };
  return (
    <View role="table" aria-label={label} style={styles.row}>
      <View>
        <Text role="columnheader" style={[cell, styles.corner, labelWidth]}>{'j\\i'}</Text>
        {g.js.map((j) => <Text key={j} role="rowheader" style={[cell, styles.head, labelWidth]}>{j}</Text>)}
      </View>
      <ScrollView horizontal>
        <View>
          <View role="row" style={styles.row}>
            {g.is.map((i) => <Text key={i} role="columnheader" style={[cell, styles.head, { width: width(i) }]}>{i}</Text>)}
          </View>
          {g.js.map((j) => (
            <View key={j} role="row" style={styles.row}>
              {g.is.map((i) => {
                const x = g.at(i, j);
                return (
                  <View key={i} role="cell" style={[cell, { width: width(i) }, x && styles.filled]}>
                    {x ? <TeX tex={groupText(x, ring, 'tex')} text={groupText(x, ring)} nowrap /> : null}
                  </View>
                );
              })}
            </View>
          ))}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
  cell: { minHeight: 36, padding: space.xs, borderWidth: StyleSheet.hairlineWidth, borderColor: colors.line, alignItems: 'center', justifyContent: 'center', textAlign: 'center' },
  cellCompact: { minHeight: 26, padding: 2, borderWidth: StyleSheet.hairlineWidth, borderColor: colors.line, alignItems: 'center', justifyContent: 'center', textAlign: 'center', fontSize: 11 },
  head: { fontFamily: fonts.mono, color: colors.inkMuted, backgroundColor: colors.sunken },
  corner: { fontFamily: fonts.mono, color: colors.inkFaint, backgroundColor: colors.sunken },
  filled: { backgroundColor: colors.surface },
  muted: { ...type.small, color: colors.inkFaint },
});
