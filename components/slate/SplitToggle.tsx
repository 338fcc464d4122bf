// On a phone the Slate and the Readout share the height: this bar under the canvas gives the
// Readout about a quarter of the screen more (the canvas a strip, still showing the whole
// drawing) once the drawing is done, or gives it back to draw.
import { useEffect, useRef, useState } from 'react';
import { Pressable, StyleSheet, Text } from 'react-native';
import { useSlate } from '@/lib/slate/slate-store';
import { colors, space, type } from '@/constants/theme';

/** Share of the screen's height the canvas takes: drawing, or reading (a strip that still shows the fitted drawing). */
export const canvasHeight = (screen: number, reading: boolean) =>
  reading ? Math.max(140, Math.round(screen * 0.18)) : Math.max(280, Math.round(screen * 0.46));

/** Which way the phone's height is shared; the drawing is fitted again once the canvas has its new size. */
export function useSplit() {
  const [reading, setReading] = useState(false);
  const refit = useRef(false);
  const height = useSlate((s) => s.size.height);
  useEffect(() => {
    if (!refit.current) return;
    refit.current = false;
    useSlate.getState().fit();
  }, [height]);
  const toggle = () => {
    refit.current = true;
    setReading((r) => !r);
  };
  return { reading, toggle };
}

export function SplitToggle({ reading, onToggle }: { reading: boolean; onToggle: () => void }) {
  const label = reading ? 'More room to draw' : 'More room for the Readout';
  return (
    <Pressable role="button" accessibilityLabel={label} onPress={onToggle} style={styles.bar}>
      <Text style={styles.text}>{reading ? '▼ ' : '▲ '}{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  bar: { minHeight: 44, justifyContent: 'center', alignItems: 'center', borderBottomWidth: 1, borderBottomColor: colors.line, backgroundColor: colors.surface },
  text: { ...type.label, color: colors.accent, paddingHorizontal: space.md },
});
