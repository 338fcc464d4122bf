// The Slate's header: back (phones), the title with what is known about the sketch (a tap opens
// its details), and the Share and Details buttons (and the shortcut sheet when wide).
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { router } from 'expo-router';
import type { LocalSketch } from '@/lib/store/types';
import { useKnownGroups } from '@/hooks/queries/useLocalSketches';
import { useShortcutRegistry } from '@/components/shell/shortcuts';
import { useIsWide } from '@/components/shell/useIsWide';
import { sharedLabel, useRefusedShares } from './ShareControl';
import { colors, fonts, space, type } from '@/constants/theme';

export function SlateHeader({ sketch, onDetails, onShare }: { sketch: LocalSketch; onDetails: () => void; onShare: () => void }) {
  const wide = useIsWide();
  // A refused share (S24) shows beside the label, so the owner opens Share to read why.
  const shareRefused = useRefusedShares(sketch.id).length > 0 ? 'share refused by the server' : null;
  const shared = sharedLabel(sketch, useKnownGroups());
  const meta = [shared, shareRefused, sketch.seenAt, sketch.tags.map((t) => `#${t}`).join(' ')].filter(Boolean).join(' · ');
  // A titled sketch is not asked for a title again.
  const hint = `Add ${sketch.title ? '' : 'a title, '}where it was seen, notes, a photo`;
  return (
    <View style={styles.header}>
      {!wide ? (
        <Pressable role="link" accessibilityLabel="Sketches" onPress={() => (router.canGoBack() ? router.back() : router.replace('/sketches'))} style={styles.back}>
          <Text style={styles.backText}>‹</Text>
        </Pressable>
      ) : null}
      <Pressable role="button" accessibilityLabel="Sketch details" onPress={onDetails} style={styles.titleBox}>
        {/* Two lines on a phone before the title is cut; the details show it whole. */}
        <Text role="heading" aria-level={1} style={styles.title} numberOfLines={2}>{sketch.title || 'Untitled sketch'}</Text>
        <Text style={styles.meta} numberOfLines={1}>{meta || hint}</Text>
      </Pressable>
      <View style={styles.actions}>
        {wide ? <Pressable role="button" accessibilityLabel="Keyboard shortcuts" onPress={() => useShortcutRegistry.getState().setSheet(true)} style={styles.quiet}><Text style={styles.quietText}>?</Text></Pressable> : null}
        <Pressable role="button" accessibilityLabel="Share" onPress={onShare} style={[styles.quiet, !wide && styles.narrow]}><Text style={styles.quietText}>Share</Text></Pressable>
        <Pressable role="button" accessibilityLabel="Details" onPress={onDetails} style={[styles.quiet, !wide && styles.narrow]}><Text style={styles.quietText}>Details</Text></Pressable>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.lg, paddingTop: space.md, paddingBottom: space.xs },
  back: { minHeight: 44, minWidth: 32, justifyContent: 'center', marginLeft: -space.xs },
  backText: { fontFamily: fonts.medium, fontSize: 30, lineHeight: 34, color: colors.accent },
  titleBox: { flex: 1, minWidth: 0 },
  title: { ...type.title, color: colors.ink },
  meta: { ...type.small, color: colors.inkMuted },
  actions: { flexDirection: 'row', gap: space.xs },
  quiet: { minHeight: 44, minWidth: 44, paddingHorizontal: space.md, alignItems: 'center', justifyContent: 'center', borderRadius: 10 },
  // A phone's header gives the title the room: the buttons keep 44 px targets with less padding.
  narrow: { paddingHorizontal: space.xs },
  quietText: { ...type.label, color: colors.accent, fontSize: 15 },
});
