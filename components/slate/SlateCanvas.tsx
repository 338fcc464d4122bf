// The Slate: a dark board where a finger or a mouse draws chalk strands. One-finger pan draws
// (or moves / reshapes / pans, by tool); a tap flips a crossing, reverses at an arrow, opens a
// framing badge or selects a strand; pinch and two-finger pan zoom and pan; on web the wheel
// zooms (hooks/useSlateGestures.ts). Drags only change the preview; lifting the finger commits
// one undo step. What it draws is SlatePicture.
import { useEffect, useMemo, useState } from 'react';
import { StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import { GestureDetector } from 'react-native-gesture-handler';
import type { Analysis } from '@/shared/drawing/analyse';
import { strandPictures } from '@/lib/slate/picture';
import { fitBaseOf } from '@/lib/slate/zoom';
import { currentDoc, useSlate } from '@/lib/slate/slate-store';
import { useSlateGestures } from '@/hooks/useSlateGestures';
import { fonts, slate } from '@/constants/theme';
import { SlatePicture } from './SlatePicture';

export function SlateCanvas({ analysis, onFraming }: { analysis: Analysis; onFraming: (id: string) => void }) {
  const doc = useSlate(currentDoc);
  const view = useSlate((s) => s.view);
  const selected = useSlate((s) => s.selected);
  const selectedBand = useSlate((s) => s.selectedBand);
  const tool = useSlate((s) => s.tool);
  const fitRequest = useSlate((s) => s.fitRequest);
  const [size, setSize] = useState({ width: 0, height: 0 });
  const pictures = useMemo(() => strandPictures(doc, analysis, view, size), [doc, analysis, view, size]);
  const { gesture, surface, live } = useSlateGestures({ analysis, doc, pictures, onFraming });

  // A document from outside (opened, pasted, built) is fitted into the board once it has a size.
  useEffect(() => {
    const s = useSlate.getState();
    if (size.width === 0 || s.fitted === fitRequest) return;
    const points = s.history.present.sketch.components.flatMap((c) => c.points);
    s.markFitted(fitRequest, fitBaseOf(points, s.view, size.width, size.height));
  }, [fitRequest, size]);

  const onLayout = (e: LayoutChangeEvent) => {
    const { width, height } = e.nativeEvent.layout;
    useSlate.getState().resize(width, height);
    setSize({ width, height });
  };
  const empty = doc.sketch.components.length === 0 && !live;

  return (
    <GestureDetector gesture={gesture}>
      <View ref={surface} collapsable={false} style={styles.surface} onLayout={onLayout} testID="slate-canvas" aria-label="Slate: drawing canvas">
        <SlatePicture size={size} view={view} doc={doc} analysis={analysis} pictures={pictures} tool={tool} selected={selected} selectedBand={selectedBand} live={live} />
        {empty ? (
          <View pointerEvents="none" style={styles.hintBox}>
            <Text style={styles.hint}>Draw a strand. End it where it began to close it.</Text>
          </View>
        ) : null}
      </View>
    </GestureDetector>
  );
}

const styles = StyleSheet.create({
  surface: { flex: 1, backgroundColor: slate.surface, overflow: 'hidden' },
  hintBox: { position: 'absolute', left: 0, right: 0, top: 0, bottom: 0, alignItems: 'center', justifyContent: 'center', padding: 24 },
  hint: { fontFamily: fonts.regular, fontSize: 16, color: slate.chalkDim, textAlign: 'center' },
});
