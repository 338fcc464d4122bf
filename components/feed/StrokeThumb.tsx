// A sketch's drawing in miniature: its strokes scaled into the box, chalk on slate. A typed PD
// code has no strokes; then the box shows the crossing count instead.
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import type { Stroke } from '@/shared/api/sketches';
import { chalkFor, fonts, radius, slate } from '@/constants/theme';

function pathsOf(strokes: Stroke[], size: number, pad: number): string[] {
  const pts = strokes.flatMap((s) => s.points);
  if (pts.length === 0) return [];
  const xs = pts.map((p) => p[0]);
  const ys = pts.map((p) => p[1]);
  const [x0, y0] = [Math.min(...xs), Math.min(...ys)];
  const span = Math.max(Math.max(...xs) - x0, Math.max(...ys) - y0, 1);
  const k = (size - 2 * pad) / span;
  return strokes.map((s) =>
    s.points.map(([x, y], i) => `${i ? 'L' : 'M'}${(pad + (x - x0) * k).toFixed(1)} ${(pad + (y - y0) * k).toFixed(1)}`).join(' ') + (s.closed ? ' Z' : ''),
  );
}

export function StrokeThumb({ strokes, size, crossings }: { strokes: Stroke[]; size: number; crossings: number }) {
  const paths = pathsOf(strokes, size, size * 0.1);
  return (
    <View style={[styles.box, { width: size, height: size }]} aria-label="Drawing">
      {paths.length ? (
        <Svg width={size} height={size}>
          {paths.map((d, i) => (
            <Path key={i} d={d} stroke={chalkFor(i)} strokeWidth={Math.max(1.5, size / 48)} strokeLinecap="round" strokeLinejoin="round" fill="none" />
          ))}
        </Svg>
      ) : (
        <Text style={styles.code}>{crossings} ×</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: slate.surface, borderRadius: radius.md, alignItems: 'center', justifyContent: 'center', overflow: 'hidden' },
  code: { fontFamily: fonts.mono, fontSize: 13, color: slate.chalkDim },
});
