// The framed-link data of a shared sketch, as the Readout states it: each component's framing
// (blackboard resolved, marked "bb") and the linking number of each pair, numbered as on the
// picture (docs/conventions.md, Framings and cables). Computed on the device from the code.
import { StyleSheet, Text, View } from 'react-native';
import { readoutStages } from '@/lib/slate/readout';
import type { PictureSource } from './DiagramPicture';
import { colors, type } from '@/constants/theme';

const framingStage = readoutStages.find((s) => s.keys.includes('framings'))!;

const signed = (n: number) => (n > 0 ? `+${n}` : n < 0 ? `−${-n}` : '0');

function framedData(d: PictureSource) {
  if (d.pd.length === 0 && d.unknots === 0) return null;
  try {
    const { framings = [], linking = [] } = framingStage.run({ pd: d.pd, unknots: d.unknots, framings: d.framings }, {});
    return { framings, linking };
  } catch {
    return null; // not a valid PD code: the page says so beside the Jones polynomial
  }
}

export function FramedLink({ diagram }: { diagram: PictureSource }) {
  const data = framedData(diagram);
  if (!data) return null;
  return (
    <View style={styles.box} testID="framed-link">
      <Text style={styles.line}>
        Framings: {data.framings.map((f, i) => `${i + 1}: ${signed(f.value)}${f.blackboard ? ' (bb)' : ''}`).join('   ')}
      </Text>
      {data.linking.length ? <Text style={styles.line}>Linking numbers: {data.linking.map((l) => `lk(${l.i + 1},${l.j + 1}) = ${signed(l.value)}`).join('   ')}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: 2 },
  line: { ...type.body, color: colors.ink },
});
