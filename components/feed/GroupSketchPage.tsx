// A shared sketch in its group: picture and Readout (SharedSketchReadout), who and when, fork
// link, tags, notes, actions (SharedSketchActions), "same invariants as" links, photos and the
// discussion. Wide windows put the sketch and the discussion side by side.
import { ActivityIndicator, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { useRouter } from 'expo-router';
import type { GroupSketch, SketchRef } from '@/shared/api/feed';
import { useGroupSketch } from '@/hooks/queries/useFeed';
import { useIsWide } from '@/components/shell/useIsWide';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Section } from '@/components/ui/Section';
import { LoadError } from '@/components/ui/LoadError';
import { TWO_COLUMN_BREAKPOINT, colors, space, type } from '@/constants/theme';
import { when } from '@/lib/when';
import { Comments } from './Comments';
import { PhotoStrip } from './PhotoStrip';
import { SharedSketchActions } from './SharedSketchActions';
import { SharedSketchPicture, SharedSketchReadout } from './SharedSketchReadout';

function Refs({ refs, groupId }: { refs: SketchRef[]; groupId: string }) {
  const router = useRouter();
  return (
    <View style={styles.refs}>
      {refs.map((r) => (
        <Text key={r.id} role="link" style={styles.link} onPress={() => router.push(`/feed/${groupId}/${r.id}`)}>
          {r.title || 'Untitled sketch'} <Text style={styles.muted}>by {r.owner.displayName}</Text>
        </Text>
      ))}
    </View>
  );
}

/** Who drew it and when, where it was seen, what it was forked from, its tags. */
function Provenance({ s, groupId }: { s: GroupSketch; groupId: string }) {
  const router = useRouter();
  return (
    <>
      <Text style={styles.meta}>
        {s.owner.displayName} · {when(s.updatedAt)}{s.seenAt ? ` · seen at ${s.seenAt}` : ''}
      </Text>
      {s.forkedFrom ? (
        <Text style={styles.meta}>
          Forked from <Text role="link" style={styles.link} onPress={() => router.push(`/feed/${groupId}/${s.forkedFrom!.id}`)}>{s.forkedFrom.title || 'Untitled sketch'}</Text> by {s.forkedFrom.owner.displayName}
        </Text>
      ) : null}
      {s.tags.length ? <Text style={styles.tags}>{s.tags.map((t) => `#${t}`).join('  ')}</Text> : null}
    </>
  );
}

export function GroupSketchPage({ groupId, sketchId }: { groupId: string; sketchId: string }) {
  const router = useRouter();
  const wide = useIsWide();
  const { width } = useWindowDimensions();
  const q = useGroupSketch(groupId, sketchId);
  const back = wide ? undefined : () => (router.canGoBack() ? router.back() : router.replace('/feed'));

  if (q.isPending || q.isError) {
    return (
      <Screen>
        <PageTitle title="Sketch" onBack={back} backLabel="Feed" />
        {q.isPending ? <ActivityIndicator color={colors.accent} accessibilityLabel="Loading the sketch" /> : (
          <LoadError error={q.error} failed="Could not load the sketch"
            notFound={{ title: 'Not in this group', text: 'This sketch is not shared to this group any more, or you are not a member.' }} />
        )}
      </Screen>
    );
  }
  const s = q.data;
  const twoColumns = width >= TWO_COLUMN_BREAKPOINT;
  const column = [styles.col, twoColumns && styles.colSplit];

  const sketch = (
    <View style={column}>
      <SharedSketchPicture s={s} />
      <Provenance s={s} groupId={groupId} />
      <SharedSketchReadout s={s} />
      {s.notes ? <Text style={styles.notes}>{s.notes}</Text> : null}
      <SharedSketchActions s={s} />
      {s.sameInvariants.length ? (
        <Section title={`Same invariants as · ${s.sameInvariantsTotal}`} note="Same Jones polynomial, determinant and signature (so maybe the same knot drawn another way), or the same Khovanov result.">
          <Refs refs={s.sameInvariants} groupId={groupId} />
          {s.sameInvariantsTotal > s.sameInvariants.length ? <Text style={styles.muted}>{`and ${s.sameInvariantsTotal - s.sameInvariants.length} more`}</Text> : null}
        </Section>
      ) : null}
      <Section title={`Board photos · ${s.photos.length}`}>
        <PhotoStrip groupId={groupId} sketchId={s.id} photos={s.photos} canUpload={s.can.uploadPhoto} canModerate={s.can.moderate} />
      </Section>
    </View>
  );
  const discussion = (
    <View style={column}>
      <Section title={`Discussion · ${s.comments.length}`}>
        <Comments groupId={groupId} sketchId={s.id} comments={s.comments} canComment={s.can.comment} moderate={s.can.moderate} />
      </Section>
    </View>
  );

  return (
    <Screen wide>
      <PageTitle kicker="Shared sketch" title={s.title || 'Untitled sketch'} onBack={back} backLabel="Feed" />
      {twoColumns ? <View style={styles.split}>{sketch}{discussion}</View> : <>{sketch}{discussion}</>}
    </Screen>
  );
}

const styles = StyleSheet.create({
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  col: { gap: space.lg },
  colSplit: { flex: 1, minWidth: 0 },
  meta: { ...type.small, color: colors.inkMuted },
  tags: { ...type.label, color: colors.accent },
  notes: { ...type.body, color: colors.ink },
  refs: { gap: space.sm },
  link: { ...type.body, color: colors.accent },
  muted: { ...type.small, color: colors.inkMuted },
});
