// "After the bands": the drawing after every band move (shared/drawing/band-read.ts), each
// resulting component in its own chalk colour, cut where it passes under, with its components
// counted; or why there is none. Read-only: edits happen on the drawing itself.
import { useMemo, useState } from 'react';
import { StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import type { BandDrawings } from '@/shared/drawing/band-read';
import { gapsAround, visiblePieces } from '@/shared/drawing/pieces';
import { fitView, screenSizes, toScreen } from '@/lib/slate/picture';
import { chalkFor, fonts, slate } from '@/constants/theme';

export function AfterBandsView({ drawings }: { drawings: BandDrawings | { reason: string } | null }) {
  const [size, setSize] = useState({ width: 0, height: 0 });
  const onLayout = (e: LayoutChangeEvent) => setSize({ width: e.nativeEvent.layout.width, height: e.nativeEvent.layout.height });
  const ok = drawings && !('reason' in drawings) ? drawings : null;
  const pieces = useMemo(() => {
    if (!ok || size.width === 0) return [];
    const a = ok.after;
    const view = fitView(a.paths.flatMap((p) => p.points), size.width, size.height);
    const gaps = gapsAround(a.crossings, new Map(a.paths.map((p) => [p.id, p.length])), screenSizes.gap / view.k);
    return a.paths.flatMap((path, i) =>
      visiblePieces(path.points, true, gaps.filter((g) => g.component === path.id)).map((pts) => ({
        colour: chalkFor(i),
        d: pts.map((p, j) => `${j ? 'L' : 'M'}${toScreen(view, p).x.toFixed(1)} ${toScreen(view, p).y.toFixed(1)}`).join(' '),
      })),
    );
  }, [ok, size]);
  const c = ok?.afterDiagram.components;
  return (
    <View style={styles.box} onLayout={onLayout} testID="after-bands" aria-label="The drawing after the bands">
      <Svg width={size.width} height={size.height}>
        {pieces.map((p, i) => (
          <Path key={i} d={p.d} stroke={p.colour} strokeWidth={screenSizes.stroke} strokeLinecap="round" strokeLinejoin="round" fill="none" />
        ))}
      </Svg>
      <Text style={styles.caption}>
        {ok ? `After the bands · ${c} ${c === 1 ? 'component' : 'components'}` : drawings && 'reason' in drawings ? drawings.reason : 'No bands yet.'}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flex: 1, backgroundColor: slate.surface, overflow: 'hidden' },
  caption: { position: 'absolute', left: 12, top: 10, right: 12, fontFamily: fonts.medium, fontSize: 13, color: slate.band },
});
