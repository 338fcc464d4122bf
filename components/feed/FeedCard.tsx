// One shared sketch in the feed: picture, title, who and when, Readout summary, latest run, s
// when a run computed it, number of comments. The whole card opens the sketch page.
import { Image, Pressable, StyleSheet, Text, View } from 'react-native';
import type { FeedItem } from '@/shared/api/feed';
import { apiUrl } from '@/lib/api';
import { colors, radius, space, type } from '@/constants/theme';
import type { PressState } from '@/components/ui/press-state';
import { Jones } from './Jones';
import { DiagramPicture } from '@/components/ui/DiagramPicture';
import { when } from '@/lib/when';
import { minus } from '@/shared/text/integers';

const PIC = 84;

export function FeedCard({ item, onOpen, active }: { item: FeedItem; onOpen: () => void; active?: boolean }) {
  const inv = item.invariants;
  return (
    <Pressable role="link" aria-label={`Open ${item.title || 'Untitled sketch'}`} onPress={onOpen}
      style={({ hovered }: PressState) => [styles.card, (hovered || active) && styles.on]}>
      {item.photoThumbUrl ? (
        <Image source={{ uri: apiUrl(item.photoThumbUrl) }} style={styles.photo} accessibilityLabel="Board photo" />
      ) : (
        <DiagramPicture diagram={item.diagram} size={PIC} pictureKey={`${item.id}:${item.version}`} crossings={inv.crossings} label={`Picture of ${item.title || 'Untitled sketch'}`} />
      )}
      <View style={styles.body}>
        <Text style={styles.title} numberOfLines={2}>{item.title || 'Untitled sketch'}</Text>
        <Text style={styles.meta} numberOfLines={1}>{item.owner.displayName} · {when(item.updatedAt)}</Text>
        <Text style={styles.crossings}>{inv.crossings} crossing{inv.crossings === 1 ? '' : 's'}</Text>
        <View style={styles.jones}><Jones inv={inv} /></View>
        <View style={styles.foot}>
          {item.latestRun ? <Text style={styles.run} numberOfLines={1}>{item.latestRun.summary || item.latestRun.kind}</Text> : null}
          {item.latestRun?.s !== undefined ? <Text style={styles.run}>{`s = ${minus(item.latestRun.s)}`}</Text> : null}
          <Text style={styles.count}>{item.commentCount} comment{item.commentCount === 1 ? '' : 's'}</Text>
          {item.tags.slice(0, 3).map((t) => <Text key={t} style={styles.tag}>#{t}</Text>)}
        </View>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  card: { flexDirection: 'row', gap: space.md, padding: space.md, borderRadius: radius.lg, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line },
  on: { borderColor: colors.accent },
  photo: { width: PIC, height: PIC, borderRadius: radius.md, backgroundColor: colors.sunken },
  body: { flex: 1, gap: 2, minWidth: 0 },
  title: { ...type.heading, color: colors.ink },
  meta: { ...type.small, color: colors.inkMuted },
  crossings: { ...type.small, color: colors.inkMuted },
  // Its own line, free to wrap after a + or − (KaTeX breaks inline math there), so a long
  // polynomial stays whole on a phone instead of running past the card's edge.
  jones: { minWidth: 0 },
  foot: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: 2 },
  run: { ...type.label, color: colors.success },
  count: { ...type.label, color: colors.inkMuted },
  tag: { ...type.label, color: colors.accent },
});
