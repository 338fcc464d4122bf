// The bigraded Khovanov table: i across, j down (largest j on top), each nonzero group typeset.
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import type { KhGroupJson } from '@/shared/api/runs';
import { grid, groupText } from '@/shared/khovanov/format';
import { useIsWide } from '@/components/shell/useIsWide';
import { colors, fonts, space, type } from '@/constants/theme';
import { TeX } from './Math';

export function KhTable({ groups, ring, compact = false, label }: { groups: KhGroupJson[]; ring: string; compact?: boolean; label: string }) {
  const wide = useIsWide();
  const g = grid(groups);
  if (g.is.length === 0) return <Text style={styles.muted}>All groups are zero.</Text>;
  const cell = compact ? styles.cellCompact : [styles.cell, !wide && styles.cellPhone];
  return (
    <ScrollView horizontal>
      <View role="table" aria-label={label}>
        <View role="row" style={styles.row}>
          <Text role="columnheader" style={[cell, styles.corner]}>{compact ? 'j\\i' : 'j \\ i'}</Text>
          {g.is.map((i) => (
            <Text key={i} role="columnheader" style={[cell, styles.head]}>{i}</Text>
          ))}
        </View>
        {g.js.map((j) => (
          <View key={j} role="row" style={styles.row}>
            <Text role="rowheader" style={[cell, styles.head]}>{j}</Text>
            {g.is.map((i) => {
              const x = g.at(i, j);
              return (
                <View key={i} role="cell" style={[cell, x && styles.filled]}>
                  {x ? <TeX tex={groupText(x, ring, 'tex')} text={groupText(x, ring)} nowrap /> : null}
                </View>
              );
            })}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
  cell: { width: 88, minHeight: 36, padding: space.xs, borderWidth: StyleSheet.hairlineWidth, borderColor: colors.line, alignItems: 'center', justifyContent: 'center', textAlign: 'center' },
  cellPhone: { width: 60 },
  cellCompact: { width: 52, minHeight: 26, padding: 2, borderWidth: StyleSheet.hairlineWidth, borderColor: colors.line, alignItems: 'center', justifyContent: 'center', textAlign: 'center', fontSize: 11 },
  head: { fontFamily: fonts.mono, color: colors.inkMuted, backgroundColor: colors.sunken },
  corner: { fontFamily: fonts.mono, color: colors.inkFaint, backgroundColor: colors.sunken },
  filled: { backgroundColor: colors.surface },
  muted: { ...type.small, color: colors.inkFaint },
});
