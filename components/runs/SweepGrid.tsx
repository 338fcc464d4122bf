// A cable sweep's cells: r+ across, r- down, each cell its own small Khovanov table.
import { StyleSheet, Text, View } from 'react-native';
import type { RunDetail } from '@/shared/api/runs';
import { Section } from '@/components/ui/Section';
import { colors, radius, space, type } from '@/constants/theme';
import { KhTable } from './KhTable';
import { ProgressBar } from './ProgressBar';
import { statusLabel } from './format';

type Cell = RunDetail['children'][number];

export function SweepGrid({ cells }: { cells: Cell[] }) {
  const at = new Map(cells.map((c) => [`${c.cable![0][0]},${c.cable![0][1]}`, c]));
  const max = Math.max(0, ...cells.map((c) => c.cable![0][0] + c.cable![0][1]));
  const rows = Array.from({ length: max + 1 }, (_, m) => m);
  return (
    <Section title="Cables" note="(r+, r-): r+ parallel and r- reversed copies, following the framing.">
      <View style={styles.grid}>
        {rows.map((minus) => (
          <View key={minus} style={styles.row}>
            {rows.map((plus) => {
              const c = at.get(`${plus},${minus}`);
              if (!c) return null;
              return (
                <View key={plus} style={styles.cell} testID={`cable-${plus}-${minus}`}>
                  <Text style={styles.title}>{`(${plus}, ${minus}) · ${c.crossings} crossings`}</Text>
                  {c.result ? (
                    <KhTable groups={c.result.groups} ring={c.result.ring} compact label={`Khovanov homology of the (${plus}, ${minus}) cable`} />
                  ) : (
                    <>
                      <Text style={styles.muted}>{statusLabel[c.status]}{c.error ? `: ${c.error}` : ''}</Text>
                      <ProgressBar fraction={c.progress.fraction} status={c.status} label={`Progress of the (${plus}, ${minus}) cable`} />
                    </>
                  )}
                </View>
              );
            })}
          </View>
        ))}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { gap: space.xs, padding: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, maxWidth: '100%' },
  title: { ...type.label, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
});
