// The framed-link data of a shared sketch, as the Readout states it: each component's framing
// (blackboard resolved, marked "bb") and the linking number of each pair, numbered as on the
// picture and the Slate: in drawing order (docs/conventions.md, Framings and cables). Computed
// on the device from the code.
import { useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { SlateGeometry } from '@/shared/api/sketches';
import { analyse } from '@/shared/drawing/analyse';
import { drawingNumbers } from '@/lib/slate/picture';
import { readoutStages } from '@/lib/slate/readout';
import type { PictureSource } from './DiagramPicture';
import { colors, type } from '@/constants/theme';

const framingStage = readoutStages.find((s) => s.keys.includes('framings'))!;

const signed = (n: number) => (n > 0 ? `+${n}` : n < 0 ? `−${-n}` : '0');

/**
 * The picture's number of each diagram component: from the drawing (its components in the order
 * drawn, as the Slate numbers them); a typed code's layout draws them in the code's order.
 */
function numbersOf(d: PictureSource, count: number): number[] {
  const g = SlateGeometry.safeParse(d.geometry);
  const ids = g.success ? analyse(g.data).diagram?.componentIds : undefined;
  if (!g.success || !ids || ids.length !== count) return Array.from({ length: count }, (_, i) => i + 1);
  const numbers = drawingNumbers({ sketch: g.data, colours: {} });
  return ids.map((id, i) => numbers.get(id) ?? i + 1);
}

function framedData(d: PictureSource) {
  if (d.pd.length === 0 && d.unknots === 0) return null;
  try {
    const { framings = [], linking = [] } = framingStage.run({ pd: d.pd, unknots: d.unknots, framings: d.framings }, {});
    const n = numbersOf(d, framings.length);
    return {
      framings: framings.map((f, i) => ({ ...f, n: n[i] })).sort((a, b) => a.n - b.n),
      linking: linking.map((l) => ({ value: l.value, i: Math.min(n[l.i], n[l.j]), j: Math.max(n[l.i], n[l.j]) })).sort((a, b) => a.i - b.i || a.j - b.j),
    };
  } catch {
    return null; // not a valid PD code: the page says so beside the Jones polynomial
  }
}

export function FramedLink({ diagram }: { diagram: PictureSource }) {
  const data = useMemo(() => framedData(diagram), [diagram]);
  if (!data) return null;
  return (
    <View style={styles.box} testID="framed-link">
      <Text style={styles.line}>
        Framings: {data.framings.map((f) => `${f.n}: ${signed(f.value)}${f.blackboard ? ' (bb)' : ''}`).join('   ')}
      </Text>
      {data.linking.length ? <Text style={styles.line}>Linking numbers: {data.linking.map((l) => `lk(${l.i},${l.j}) = ${signed(l.value)}`).join('   ')}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: 2 },
  line: { ...type.body, color: colors.ink },
});
