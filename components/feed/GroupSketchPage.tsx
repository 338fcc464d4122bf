// A shared sketch in its group: picture and Readout (SharedSketchReadout), who and when, fork
// link, tags (SketchProvenance), notes, actions (SharedSketchActions), "same invariants as"
// links, photos and the discussion. Wide windows put the sketch and the discussion side by side.
import { ActivityIndicator, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { useRouter } from 'expo-router';
import type { GroupSketch } from '@/shared/api/feed';
import { useGroupSketch } from '@/hooks/queries/useFeed';
import { useIsWide } from '@/components/shell/useIsWide';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Section } from '@/components/ui/Section';
import { LoadError } from '@/components/ui/LoadError';
import { Banner } from '@/components/ui/Banner';
import { TWO_COLUMN_BREAKPOINT, colors, space, type } from '@/constants/theme';
import { Comments } from './Comments';
import { PhotoStrip } from './PhotoStrip';
import { SameInvariants } from './SameInvariants';
import { SharedSketchActions } from './SharedSketchActions';
import { SharedSketchPicture, SharedSketchReadout } from './SharedSketchReadout';
import { SketchProvenance } from './SketchProvenance';

export function GroupSketchPage({ groupId, sketchId }: { groupId: string; sketchId: string }) {
  const router = useRouter();
  const wide = useIsWide();
  const q = useGroupSketch(groupId, sketchId);
  const back = wide ? undefined : () => (router.canGoBack() ? router.back() : router.replace('/feed'));
  // A failed refetch keeps the page it had (and the comment being typed), with a banner.
  if (q.data === undefined) {
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
  return (
    <Screen wide>
      <PageTitle kicker="Shared sketch" title={q.data.title || 'Untitled sketch'} onBack={back} backLabel="Feed" />
      {q.isError ? <Banner tone="error">Could not refresh the sketch: {q.error.message}</Banner> : null}
      <SketchAndDiscussion s={q.data} groupId={groupId} />
    </Screen>
  );
}

/** The sketch's column and the discussion's: side by side when the window is wide enough. */
function SketchAndDiscussion({ s, groupId }: { s: GroupSketch; groupId: string }) {
  const twoColumns = useWindowDimensions().width >= TWO_COLUMN_BREAKPOINT;
  const column = [styles.col, twoColumns && styles.colSplit];
  const sketch = (
    <View style={column}>
      <SharedSketchPicture s={s} />
      <SketchProvenance s={s} groupId={groupId} />
      <SharedSketchReadout s={s} />
      {s.notes ? <Text style={styles.notes}>{s.notes}</Text> : null}
      <SharedSketchActions s={s} />
      <SameInvariants s={s} groupId={groupId} />
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
  return twoColumns ? <View style={styles.split}>{sketch}{discussion}</View> : <>{sketch}{discussion}</>;
}

const styles = StyleSheet.create({
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  col: { gap: space.lg },
  colSplit: { flex: 1, minWidth: 0 },
  notes: { ...type.body, color: colors.ink },
});
