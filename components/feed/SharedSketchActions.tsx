// What a member can do with a shared sketch: fork it into their sketchbook (a side action on
// their own sketch), start a run on it, or stop sharing their own; with the outcome below.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import type { GroupSketch } from '@/shared/api/feed';
import { useFork, useShare } from '@/hooks/queries/useFeed';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { colors, space, type } from '@/constants/theme';
import { pdToText } from '@/shared/text/codes';

export function SharedSketchActions({ s }: { s: GroupSketch }) {
  const router = useRouter();
  const fork = useFork();
  const share = useShare();
  const [forked, setForked] = useState<string | null>(null);
  const { pd } = s.diagram;
  return (
    <>
      <View style={styles.actions}>
        {/* On my own sketch a fork is a side action, not the page's first button. */}
        <Button variant={s.can.unshare ? 'secondary' : 'primary'} label="Fork into my sketchbook" busy={fork.isPending} busyLabel="Forking…"
          onPress={() => fork.mutate(s.id, { onSuccess: (r) => setForked(r.id) })} />
        {s.can.comment && pd.length ? (
          <Button variant="secondary" label="Start a run"
            onPress={() => router.push(`/runs?sketchId=${encodeURIComponent(s.id)}&pd=${encodeURIComponent(pdToText(pd))}`)} />
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
    </>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  link: { ...type.body, color: colors.accent },
});
