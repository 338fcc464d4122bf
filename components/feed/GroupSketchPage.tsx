// A shared sketch in its group: picture, Readout summary, PD code, fork, photos, "same
// invariants as" links and the discussion. Wide windows put the sketch and the discussion
// side by side.
import { useState } from 'react';
import { ActivityIndicator, Image, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { useRouter } from 'expo-router';
import type { GroupSketch, SketchRef } from '@/shared/api/feed';
import { useFork, useGroupSketch, useShare } from '@/hooks/queries/useFeed';
import { apiUrl } from '@/lib/api';
import { useIsWide } from '@/components/shell/useIsWide';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Section } from '@/components/ui/Section';
import { Banner } from '@/components/ui/Banner';
import { LoadError } from '@/components/ui/LoadError';
import { Button } from '@/components/ui/Button';
import { colors, radius, space, type } from '@/constants/theme';
import { Comments } from './Comments';
import { Jones } from './Jones';
import { PhotoStrip } from './PhotoStrip';
import { StrokeThumb } from './StrokeThumb';
import { superscripts } from './superscripts';
import { when } from '@/lib/when';

const pdText = (pd: GroupSketch['pd']) => pd.map((x) => `X[${x.join(',')}]`).join(' ');

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

export function GroupSketchPage({ groupId, sketchId }: { groupId: string; sketchId: string }) {
  const router = useRouter();
  const wide = useIsWide();
  const { width } = useWindowDimensions();
  const q = useGroupSketch(groupId, sketchId);
  const fork = useFork();
  const share = useShare();
  const [forked, setForked] = useState<string | null>(null);
  const back = wide ? undefined : () => (router.canGoBack() ? router.back() : router.replace('/feed'));

  if (q.isPending) {
    return (
      <Screen>
        <PageTitle title="Sketch" onBack={back} backLabel="Feed" />
        <ActivityIndicator color={colors.accent} accessibilityLabel="Loading the sketch" />
      </Screen>
    );
  }
  if (q.isError) {
    return (
      <Screen>
        <PageTitle title="Sketch" onBack={back} backLabel="Feed" />
        <LoadError error={q.error} failed="Could not load the sketch"
          notFound={{ title: 'Not in this group', text: 'This sketch is not shared to this group any more, or you are not a member.' }} />
      </Screen>
    );
  }
  const s = q.data;
  const photo = s.photos[0];
  const twoColumns = width >= 1280;

  const sketch = (
    <View style={[styles.col, twoColumns && styles.colSplit]}>
      <View style={styles.picture}>
        {photo ? (
          <View style={[styles.hero, { aspectRatio: photo.width / photo.height }]}>
            <Image source={{ uri: apiUrl(photo.url) }} style={StyleSheet.absoluteFill} resizeMode="cover" accessibilityLabel="Board photo" />
          </View>
        ) : null}
        <StrokeThumb strokes={s.strokes} size={photo ? 96 : 220} crossings={s.invariants.crossings} />
      </View>
      <Text style={styles.meta}>
        {s.owner.displayName} · {when(s.updatedAt)}{s.seenAt ? ` · seen at ${s.seenAt}` : ''}
      </Text>
      {s.forkedFrom ? (
        <Text style={styles.meta}>
          Forked from <Text role="link" style={styles.link} onPress={() => router.push(`/feed/${groupId}/${s.forkedFrom!.id}`)}>{s.forkedFrom.title || 'Untitled sketch'}</Text> by {s.forkedFrom.owner.displayName}
        </Text>
      ) : null}
      {s.tags.length ? <Text style={styles.tags}>{s.tags.map((t) => `#${t}`).join('  ')}</Text> : null}
      <Section title="Readout">
        <Text style={styles.readout}>
          {s.invariants.crossings} crossings{s.invariants.components !== null ? ` · ${s.invariants.components} component${s.invariants.components === 1 ? '' : 's'}` : ''}
        </Text>
        {s.invariants.jones ? <Jones inv={s.invariants} lhs="V(t)" /> : <Text style={styles.muted}>No Jones polynomial: the diagram is too large or not a valid PD code.</Text>}
        {s.pd.length ? <Text style={styles.code} selectable>{pdText(s.pd)}</Text> : null}
        {s.latestRun ? (
          <Text role="link" style={styles.run} onPress={() => router.push(`/runs/${s.latestRun!.id}`)}>
            Latest run: {superscripts(s.latestRun.summary) || s.latestRun.kind} ›
          </Text>
        ) : null}
      </Section>
      {s.notes ? <Text style={styles.notes}>{s.notes}</Text> : null}
      <View style={styles.actions}>
        {/* On my own sketch a fork is a side action, not the page's first button. */}
        <Button variant={s.can.unshare ? 'secondary' : 'primary'} label="Fork into my sketchbook" busy={fork.isPending} busyLabel="Forking…"
          onPress={() => fork.mutate(s.id, { onSuccess: (r) => setForked(r.id) })} />
        {s.can.comment && s.pd.length ? (
          <Button variant="secondary" label="Start a run"
            onPress={() => router.push(`/runs?sketchId=${encodeURIComponent(s.id)}&pd=${encodeURIComponent(JSON.stringify(s.pd))}`)} />
        ) : null}
        {s.can.unshare ? (
          <Button variant="danger" label="Stop sharing" busy={share.isPending} busyLabel="Stopping…"
            onPress={() => share.mutate({ sketchId: s.id, groupId: null }, { onSuccess: () => router.replace('/feed') })} />
        ) : null}
      </View>
      {forked ? (
        <Banner tone="success" title="Forked">
          A private copy is in your sketchbook. <Text role="link" style={styles.link} onPress={() => router.push(`/sketches/${forked}`)}>Open it</Text>
        </Banner>
      ) : null}
      {fork.error ? <Banner tone="error">{fork.error.message}</Banner> : null}
      {s.sameInvariants.length ? (
        <Section title="Same invariants as" note="Same crossing count and Jones polynomial, or the same Khovanov result.">
          <Refs refs={s.sameInvariants} groupId={groupId} />
        </Section>
      ) : null}
      <Section title={`Board photos · ${s.photos.length}`}>
        <PhotoStrip groupId={groupId} sketchId={s.id} photos={s.photos} canUpload={s.can.uploadPhoto} canModerate={s.can.moderate} />
      </Section>
    </View>
  );
  const discussion = (
    <View style={[styles.col, twoColumns && styles.colSplit]}>
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
  picture: { gap: space.sm, alignItems: 'flex-start' },
  hero: { width: '100%', maxWidth: 640, borderRadius: radius.lg, overflow: 'hidden', backgroundColor: colors.sunken },
  meta: { ...type.small, color: colors.inkMuted },
  tags: { ...type.label, color: colors.accent },
  readout: { ...type.body, color: colors.ink },
  code: { ...type.code, color: colors.inkMuted },
  run: { ...type.label, color: colors.success },
  notes: { ...type.body, color: colors.ink },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  refs: { gap: space.sm },
  link: { ...type.body, color: colors.accent },
  muted: { ...type.small, color: colors.inkMuted },
});
