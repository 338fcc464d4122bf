// Where the Slate's parts go: on a wide screen the board left and the Readout in a side pane;
// on a phone the Readout below the board, the height shared by the split bar (SplitToggle).
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';
import { useIsWide } from '@/components/shell/useIsWide';
import { colors, space } from '@/constants/theme';
import { SplitToggle, canvasHeight, useSplit } from './SplitToggle';

interface Props {
  header: ReactNode;
  toolbar: ReactNode;
  canvas: ReactNode;
  /** The bars under the canvas (selection, bands). */
  bars: ReactNode;
  readout: ReactNode;
}

export function SlateLayout({ header, toolbar, canvas, bars, readout }: Props) {
  const wide = useIsWide();
  const { height } = useWindowDimensions();
  const { reading, toggle } = useSplit(); // phone: a shorter canvas, more Readout
  if (wide) {
    return (
      <View style={styles.split}>
        <View style={styles.main}>
          {header}
          {toolbar}
          <View style={styles.canvasWide}>{canvas}</View>
          {bars}
        </View>
        <ScrollView style={styles.side} contentContainerStyle={styles.sideContent}>{readout}</ScrollView>
      </View>
    );
  }
  // The board stays put (a page that scrolls would fight the drawing finger); the Readout scrolls below it.
  return (
    <View style={styles.main}>
      {header}
      {toolbar}
      <View style={{ height: canvasHeight(height, reading) }}>{canvas}</View>
      {bars}
      <SplitToggle reading={reading} onToggle={toggle} />
      <ScrollView style={styles.main} contentContainerStyle={styles.phoneReadout} keyboardShouldPersistTaps="handled">{readout}</ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  split: { flex: 1, flexDirection: 'row' },
  main: { flex: 1 },
  side: { width: 330, flexGrow: 0, borderLeftWidth: 1, borderLeftColor: colors.line, backgroundColor: colors.surface },
  sideContent: { padding: space.xl, gap: space.lg },
  phoneReadout: { padding: space.lg + 4, paddingBottom: space.xxxl, gap: space.lg },
  canvasWide: { flex: 1, flexDirection: 'row', gap: 2 },
});
