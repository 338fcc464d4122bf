// A shared sketch's mathematics as its owner saw it on the Slate: the picture (gaps, colours,
// orientation arrows, each component's number and framing), the crossing and component count,
// the framed-link data, the Jones polynomial, s with its slice-genus bounds when a run of the
// sketch computed it, the PD code and the latest run.
import { useState } from 'react';
import { Image, StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import type { GroupSketch } from '@/shared/api/feed';
import { apiUrl } from '@/lib/api';
import { Section } from '@/components/ui/Section';
import { colors, radius, space, type } from '@/constants/theme';
import { DiagramPicture } from '@/components/ui/DiagramPicture';
import { FramedLink } from './FramedLink';
import { Jones } from './Jones';
import { pdToText } from '@/shared/text/codes';
import { SliceBounds } from '@/components/ui/SliceBounds';
import { minus } from '@/shared/text/integers';

/**
 * The picture fills the column up to a cap, so it is as wide as the phone's column and not a
 * poster on a wide pane (beside a photo it stays small); whole tens of pixels, so a few pixels of resizing keep the cached picture.
 */
export const pictureSize = (column: number) => Math.max(160, Math.min(480, Math.floor(column / 10) * 10));

export function SharedSketchPicture({ s }: { s: GroupSketch }) {
  const photo = s.photos[0];
  const [column, setColumn] = useState<number | null>(null);
  const size = Math.min(photo ? 220 : Infinity, column === null ? 300 : pictureSize(column));
  return (
    <View style={styles.picture} testID="shared-picture" onLayout={(e) => setColumn(e.nativeEvent.layout.width)}>
      {photo ? (
        <View style={[styles.hero, { aspectRatio: photo.width / photo.height }]}>
          <Image source={{ uri: apiUrl(photo.url) }} style={StyleSheet.absoluteFill} resizeMode="cover" accessibilityLabel="Board photo" />
        </View>
      ) : null}
      <DiagramPicture diagram={s.diagram} size={size} pictureKey={`${s.id}:${s.version}`} crossings={s.invariants.crossings} marks
        label={`Picture of ${s.title || 'Untitled sketch'}`} />
    </View>
  );
}

/** s over Q from the latest run that computed it, with the bounds it and the signature give. */
function SFromRun({ s, diagram }: { s: number; diagram: GroupSketch['diagram'] }) {
  return (
    <View testID="shared-s">
      <Text style={styles.readout}>{`s = ${minus(s)} over Q (Rasmussen, from a run)`}</Text>
      <SliceBounds s={s} diagram={diagram} />
    </View>
  );
}

export function SharedSketchReadout({ s }: { s: GroupSketch }) {
  const router = useRouter();
  const { crossings, components } = s.invariants;
  return (
    <Section title="Readout">
      <Text style={styles.readout}>
        {crossings} crossings{components !== null ? ` · ${components} component${components === 1 ? '' : 's'}` : ''}
      </Text>
      <FramedLink diagram={s.diagram} />
      {s.invariants.jones || s.invariants.computing ? <Jones inv={s.invariants} lhs="V(t)" /> : <Text style={styles.muted}>No Jones polynomial: the diagram is too large or not a valid PD code.</Text>}
      {s.latestRun?.s !== undefined ? <SFromRun s={s.latestRun.s} diagram={s.diagram} /> : null}
      {s.diagram.pd.length ? <Text style={styles.code} selectable>{pdToText(s.diagram.pd)}</Text> : null}
      {s.latestRun ? (
        <Text role="link" style={styles.run} onPress={() => router.push(`/runs/${s.latestRun!.id}`)}>
          Latest run: {s.latestRun.summary || s.latestRun.kind} ›
        </Text>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  picture: { gap: space.sm, alignItems: 'flex-start' },
  hero: { width: '100%', maxWidth: 640, borderRadius: radius.lg, overflow: 'hidden', backgroundColor: colors.sunken },
  readout: { ...type.body, color: colors.ink },
  code: { ...type.code, color: colors.inkMuted },
  run: { ...type.label, color: colors.success },
  muted: { ...type.small, color: colors.inkMuted },
});
