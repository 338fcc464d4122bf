// A cable sweep's cells, each its own small Khovanov table: for a knot r+ across and r- down,
// for a link one cell per combination of (r+, r-) per component. Each cell opens as its own run
// page (Poincare polynomial, Euler check, exports); a table wider than its card scrolls in it.
import { StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { runPagePath, type RunDetail } from '@/shared/api/runs';
import { Section } from '@/components/ui/Section';
import { colors, radius, space, type } from '@/constants/theme';
import { CableCopies, CablePair } from './CableWords';
import { KhTable } from './KhTable';
import { ProgressBar } from './ProgressBar';
import { statusLabel } from '@/lib/run-format';

type Cell = RunDetail['children'][number];

const pairs = (c: Cell) => c.cable!.map(([p, m]) => `${p}, ${m}`).join(' | ');

function CellCard({ c }: { c: Cell }) {
  const name = `(${pairs(c)})`;
  return (
    <View style={styles.cell} testID={`cable-${c.cable!.flat().join('-')}`}>
      <Link href={runPagePath(c.id)} style={styles.title} aria-label={`Open the ${name} cable`}>{`${name} · ${c.crossings} crossings ›`}</Link>
      {c.result ? (
        <KhTable groups={c.result.groups} ring={c.result.ring} compact label={`Khovanov homology of the ${name} cable`} />
      ) : (
        <>
          <Text style={styles.muted}>{statusLabel[c.status]}{c.error ? `: ${c.error}` : ''}</Text>
          <ProgressBar fraction={c.progress.fraction} status={c.status} label={`Progress of the ${name} cable`} />
        </>
      )}
    </View>
  );
}

export function SweepGrid({ cells }: { cells: Cell[] }) {
  const knot = cells.every((c) => c.cable!.length === 1);
  const max = Math.max(0, ...cells.map((c) => c.cable![0][0] + c.cable![0][1]));
  const rows = Array.from({ length: max + 1 }, (_, m) => m);
  const at = new Map(cells.map((c) => [pairs(c), c]));
  return (
    <Section title="Cables" note={<><CablePair />: <CableCopies /></>}>
      {knot ? (
        <View style={styles.grid}>
          {rows.map((minus) => (
            <View key={minus} style={styles.row}>
              {rows.map((plus) => {
                const c = at.get(`${plus}, ${minus}`);
                return c ? <CellCard key={plus} c={c} /> : null;
              })}
            </View>
          ))}
        </View>
      ) : (
        <View style={styles.row}>{cells.map((c) => <CellCard key={c.id} c={c} />)}</View>
      )}
    </Section>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { gap: space.xs, padding: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, maxWidth: '100%', minWidth: 0, flexShrink: 1 },
  title: { ...type.label, color: colors.accent },
  muted: { ...type.small, color: colors.inkMuted },
});
