// The slice-genus bounds a known s gives beside the diagram's signature, as one muted line
// (shared/rasmussen: |s|/2 and |sigma|/2, which is stronger). Nothing for a code that is no diagram.
import { useMemo } from 'react';
import { StyleSheet, Text } from 'react-native';
import type { RunDiagram } from '@/shared/api/runs';
import { diagram as toDiagram } from '@/shared/knot/diagram';
import { linkSignature } from '@/shared/knot/goeritz';
import { sliceBoundsText, sliceGenusBounds } from '@/shared/rasmussen';
import { colors, type } from '@/constants/theme';

export function SliceBounds({ s, diagram }: { s: number; diagram: Pick<RunDiagram, 'pd'> & { unknots?: number } }) {
  const text = useMemo(() => {
    try {
      return sliceBoundsText(sliceGenusBounds(s, linkSignature(toDiagram(diagram.pd, { unknots: diagram.unknots ?? 0 }))));
    } catch {
      return null;
    }
  }, [s, diagram]);
  return text ? <Text style={styles.muted}>{text}</Text> : null;
}

const styles = StyleSheet.create({
  muted: { ...type.small, color: colors.inkMuted },
});
