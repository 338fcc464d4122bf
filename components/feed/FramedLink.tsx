// The framed-link data of a shared sketch, as the Readout states it: each component's framing
// (blackboard resolved, marked "bb") and the linking number of each pair, numbered as on the
// picture and the Slate: in drawing order (docs/conventions.md, Framings and cables). Computed
// on the device from the code.
import { useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { analyse } from '@/shared/drawing/analyse';
import { framedText } from '@/lib/slate/framed-text';
import { diagramNumbers } from '@/lib/slate/picture';
import { readoutStages } from '@/lib/slate/readout';
import { docFromStored } from '@/lib/slate/record';
import type { PictureSource } from '@/components/ui/DiagramPicture';
import { colors, type } from '@/constants/theme';

const framingStage = readoutStages.find((s) => s.keys.includes('framings'))!;

/**
 * The Slate's numbers when the sketch was drawn there (its drawing order); undefined (1, 2, ...,
 * the order a typed code's layout draws them in) for a code, or a drawing that does not give
 * this code's components.
 */
function numbersOf(d: PictureSource, count: number): number[] | undefined {
  if (d.geometry == null) return undefined;
  try {
    const doc = docFromStored({ ...d, strokes: [] });
    const numbers = diagramNumbers(doc, analyse(doc.sketch));
    return numbers?.length === count ? numbers : undefined;
  } catch {
    return undefined;
  }
}

function framedData(d: PictureSource) {
  if (d.pd.length === 0 && d.unknots === 0) return null;
  try {
    const { framings = [], linking = [] } = framingStage.run({ pd: d.pd, unknots: d.unknots, framings: d.framings }, {});
    return framedText(framings, linking, numbersOf(d, framings.length));
  } catch {
    return null; // not a valid PD code: the page says so beside the Jones polynomial
  }
}

export function FramedLink({ diagram }: { diagram: PictureSource }) {
  const data = useMemo(() => framedData(diagram), [diagram]);
  if (!data) return null;
  return (
    <View style={styles.box} testID="framed-link">
      <Text style={styles.line}>Framings: {data.framings}</Text>
      {data.linking ? <Text style={styles.line}>Linking numbers: {data.linking}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: 2 },
  line: { ...type.body, color: colors.ink },
});
