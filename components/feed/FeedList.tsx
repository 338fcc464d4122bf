// The Feed tab's list: pick a group, filter (tag, person, has results), scroll the shared
// sketches newest first; more pages load as the end comes into view.
import { useEffect, useState } from 'react';
import { ActivityIndicator, FlatList, StyleSheet, Text, TextInput, View } from 'react-native';
import { useGlobalSearchParams, useRouter } from 'expo-router';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { canPost } from '@/shared/api/feed-rules';
import { useGroups } from '@/hooks/queries/useGroups';
import { useFeed, useGroupPeople, type FeedFilters } from '@/hooks/queries/useFeed';
import { isApiError } from '@/lib/api';
import { PageTitle } from '@/components/ui/PageTitle';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { EmptyState } from '@/components/ui/EmptyState';
import { FeedIcon } from '@/components/shell/icons';
import { useFilterShortcut } from '@/components/shell/shortcuts';
import { COLUMN_MAX, colors, fonts, radius, space, type } from '@/constants/theme';
import { Chip } from './Chip';
import { FeedCard } from './FeedCard';
import { PeopleFilter } from './PeopleFilter';
import { ShareSketch } from './ShareSketch';

export function FeedList() {
  const router = useRouter();
  const insets = useSafeAreaInsets();
  const groups = useGroups();
  const params = useGlobalSearchParams<{ groupId?: string; sketchId?: string }>();
  const [groupId, setGroupId] = useState<string | null>(null);
  const [filters, setFilters] = useState<FeedFilters>({});
  const [tagDraft, setTagDraft] = useState('');
  const [sharing, setSharing] = useState(false);
  const tagField = useFilterShortcut('Feed', 'Filter by tag');
  useEffect(() => {
    const first = params.groupId ?? groups.data?.[0]?.id;
    if (!groupId && first) setGroupId(first);
  }, [groups.data, params.groupId, groupId]);
  const group = groups.data?.find((g) => g.id === groupId);
  const members = useGroupPeople(groupId);
  const feed = useFeed(groupId, filters);
  const items = feed.data?.pages.flatMap((p) => p.items) ?? [];
  const open = (sketchId: string) => router.push(`/feed/${groupId}/${sketchId}`);

  if (groups.data && groups.data.length === 0) {
    return (
      <View style={[styles.pad, { paddingTop: insets.top + space.xl }]}>
        <PageTitle kicker="Group" title="Feed" />
        <EmptyState art={<FeedIcon color={colors.inkFaint} size={40} />} title="Nothing shared yet"
          action={<Button variant="secondary" label="Open my groups" onPress={() => router.navigate('/account')} />}>
          When you or someone in your group shares a sketch, it appears here to comment on, fork into your
          sketchbook, or start a run from. Join or create a group under Account first.
        </EmptyState>
      </View>
    );
  }

  const header = (
    <View style={styles.header}>
      <PageTitle kicker="Group" title="Feed" />
      <View style={styles.chips} role="tablist" aria-label="Group">
        {groups.data?.map((g) => <Chip key={g.id} label={g.name} on={g.id === groupId} onPress={() => { setGroupId(g.id); setFilters({}); }} />)}
      </View>
      <View style={styles.filters}>
        <TextInput ref={tagField} value={tagDraft} onChangeText={setTagDraft} placeholder="Filter by tag" aria-label="Filter by tag" autoCapitalize="none"
          onSubmitEditing={() => setFilters((f) => ({ ...f, tag: tagDraft.trim().replace(/^#/, '') || undefined }))} style={styles.tag} />
        <Chip label="Has results" on={!!filters.hasResults} onPress={() => setFilters((f) => ({ ...f, hasResults: !f.hasResults || undefined }))} />
      </View>
      {members.data && members.data.length > 1 ? (
        <PeopleFilter key={groupId} people={members.data} person={filters.person} onPick={(person) => setFilters((f) => ({ ...f, person }))} />
      ) : null}
      {group && canPost(group.role) ? (
        sharing ? (
          <ShareSketch groupId={group.id} onShared={(id) => { setSharing(false); open(id); }} />
        ) : (
          <View style={styles.row}><Button variant="secondary" label="Share a sketch" onPress={() => setSharing(true)} /></View>
        )
      ) : null}
      {feed.isError ? <Banner tone="error">{isApiError(feed.error) ? feed.error.message : 'Could not load the feed.'}</Banner> : null}
      {filters.tag ? <Text style={styles.muted}>Tagged #{filters.tag} · <Text style={styles.link} onPress={() => { setTagDraft(''); setFilters((f) => ({ ...f, tag: undefined })); }}>clear</Text></Text> : null}
    </View>
  );

  return (
    <FlatList
      style={styles.list}
      contentContainerStyle={[styles.content, { paddingTop: insets.top + space.xl }]}
      data={items}
      keyExtractor={(i) => i.id}
      ListHeaderComponent={header}
      renderItem={({ item }) => <FeedCard item={item} active={item.id === params.sketchId} onOpen={() => open(item.id)} />}
      ItemSeparatorComponent={() => <View style={{ height: space.md }} />}
      onEndReachedThreshold={0.5}
      onEndReached={() => feed.hasNextPage && !feed.isFetchingNextPage && feed.fetchNextPage()}
      ListEmptyComponent={feed.isPending ? <ActivityIndicator color={colors.accent} /> : (
        Object.values(filters).some(Boolean) ? <Text style={styles.muted}>No shared sketch matches these filters.</Text> : (
          <View style={styles.empty}>
            <Text style={styles.muted}>Nothing shared in this group yet.</Text>
            <Text style={styles.muted}>
              {group && canPost(group.role)
                ? 'Share a sketch from your sketchbook with the button above; the group can then comment on it, fork it and start runs.'
                : 'When a member shares a sketch, it appears here with its Readout, runs and discussion.'}
            </Text>
          </View>
        )
      )}
      ListFooterComponent={feed.isFetchingNextPage ? <ActivityIndicator color={colors.accent} style={{ marginTop: space.lg }} /> : null}
    />
  );
}

const styles = StyleSheet.create({
  list: { flex: 1, backgroundColor: colors.paper },
  content: { paddingHorizontal: space.lg + 4, paddingBottom: space.xxxl, width: '100%', maxWidth: COLUMN_MAX + 40, alignSelf: 'center' },
  pad: { paddingHorizontal: space.lg + 4, gap: space.xl, flex: 1, backgroundColor: colors.paper },
  header: { gap: space.md, marginBottom: space.lg },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  filters: { flexDirection: 'row', gap: space.sm, alignItems: 'center' },
  tag: { flex: 1, minHeight: 40, paddingHorizontal: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, fontFamily: fonts.regular, fontSize: 15, color: colors.ink },
  row: { flexDirection: 'row' },
  empty: { gap: space.xs },
  muted: { ...type.small, color: colors.inkMuted },
  link: { color: colors.accent },
});
