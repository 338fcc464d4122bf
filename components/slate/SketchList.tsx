// My sketchbook: every sketch on this device, newest edit first, with its picture, crossings,
// Jones polynomial and when it was edited. Used as the list pane (wide) and the Sketches page.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { router, usePathname } from 'expo-router';
import { useKnownGroups, useLocalSketches } from '@/hooks/queries/useLocalSketches';
import type { LocalGroup, LocalSketch } from '@/lib/store/types';
import { summaryOf } from '@/lib/slate/summary';
import { DiagramPicture } from '@/components/ui/DiagramPicture';
import { when } from '@/lib/when';
import { TeX } from '@/components/ui/Math';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { EmptyState } from '@/components/ui/EmptyState';
import { Button } from '@/components/ui/Button';
import { Banner } from '@/components/ui/Banner';
import { SlateArt } from '@/components/shell/SlateArt';
import { SyncStatus } from '@/components/sync/SyncStatus';
import { sharedLabel } from './ShareControl';
import { Choice } from '@/components/ui/Choice';
import { useSession } from '@/hooks/useSession';
import { colors, fonts, radius, space, type } from '@/constants/theme';

type Whose = 'mine' | 'shared';
const whoseOptions = [{ value: 'mine', label: 'Mine' }, { value: 'shared', label: 'Shared with me' }] as const;

/** Title, where seen, notes or a tag containing every word of the query, without case. */
const matches = (s: LocalSketch, query: string) => {
  const hay = [s.title, s.seenAt, s.notes, ...s.tags].join(' ').toLowerCase();
  return query.toLowerCase().split(/\s+/).filter(Boolean).every((w) => hay.includes(w.replace(/^#/, '')));
};

function Row({ sketch, active, groups }: { sketch: LocalSketch; active: boolean; groups: LocalGroup[] }) {
  const s = summaryOf(sketch.diagram);
  const drawn = s.crossings > 0 || s.components > 0;
  const shared = sharedLabel(sketch, groups);
  return (
    <Pressable role="link" accessibilityLabel={`Open ${sketch.title || 'Untitled sketch'}`} onPress={() => router.navigate(`/sketches/${sketch.id}`)}
      style={({ pressed, hovered }: { pressed: boolean; hovered?: boolean }) => [styles.row, active && styles.active, (pressed || hovered) && !active && styles.hover]}>
      <DiagramPicture diagram={sketch.diagram} size={64} pictureKey={`${sketch.id}:${sketch.updatedAt}`} crossings={s.crossings} label={`Picture of ${sketch.title || 'Untitled sketch'}`} />
      <View style={styles.text}>
        <Text style={styles.title} numberOfLines={1}>{sketch.title || 'Untitled sketch'}</Text>
        <Text style={styles.meta} numberOfLines={1}>
          {drawn ? `${s.crossings} crossing${s.crossings === 1 ? '' : 's'}` : sketch.diagram.strokes.length ? 'Unfinished drawing' : 'Nothing drawn yet'} · {when(sketch.updatedAt)}
          {sketch.pending ? ' · not synced' : ''}
        </Text>
        {shared ? <Text style={styles.shared} numberOfLines={1}>{shared}</Text> : null}
        {s.jones ? (
          <View style={styles.jones}>
            <TeX tex={`V = ${s.jones.format('t', 'latex')}`} text={`V = ${s.jones.format('t', 'unicode')}`} />
          </View>
        ) : null}
      </View>
    </Pressable>
  );
}

export function SketchList() {
  const list = useLocalSketches();
  const path = usePathname();
  const me = useSession((x) => x.user?.id);
  const [whose, setWhose] = useState<Whose>('mine');
  const [query, setQuery] = useState('');
  const all = list.data ?? [];
  // A sketch made here and never pulled has no owner yet: it is mine.
  const sketches = all.filter((s) => ((s.ownerId ?? me) === me) === (whose === 'mine') && matches(s, query));
  const groups = useKnownGroups();
  return (
    <Screen>
      <View style={styles.head}>
        <PageTitle kicker="Sketchbook" title="Sketches" />
        <SyncStatus />
        {all.length ? <Button label="New sketch" onPress={() => router.push('/sketches/new')} /> : null}
      </View>
      {all.length ? (
        <View style={styles.tools}>
          <Choice label="Whose sketches" options={whoseOptions} value={whose} onChange={setWhose} />
          <TextInput value={query} onChangeText={setQuery} placeholder="Search title, notes, tags" aria-label="Search sketches" autoCapitalize="none" style={styles.search} />
        </View>
      ) : null}
      {list.isError ? <Banner tone="error">{list.error.message}</Banner> : null}
      {list.data && all.length === 0 ? (
        <EmptyState art={<SlateArt />} title="Draw your first link"
          action={<Button label="New sketch" onPress={() => router.push('/sketches/new')} />}>
          Draw the strands with a finger or the mouse; crossings appear where they meet and the invariants update as you draw.
          Sketches stay on this device and work without a network.
        </EmptyState>
      ) : null}
      {all.length > 0 && sketches.length === 0 ? <Text style={styles.none}>{query ? 'No sketch here matches the search.' : whose === 'mine' ? 'None of your own yet.' : 'Nothing shared with you yet.'}</Text> : null}
      <View style={styles.list}>
        {sketches.map((s) => <Row key={s.id} sketch={s} active={path === `/sketches/${s.id}`} groups={groups} />)}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  list: { gap: space.xs },
  tools: { gap: space.sm },
  search: { minHeight: 44, paddingHorizontal: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, fontFamily: fonts.regular, fontSize: 15, color: colors.ink },
  none: { ...type.small, color: colors.inkMuted },
  row: { flexDirection: 'row', gap: space.md, padding: space.sm, borderRadius: radius.lg, alignItems: 'center' },
  active: { backgroundColor: colors.accentSoft },
  hover: { backgroundColor: colors.sunken },
  text: { flex: 1, minWidth: 0, gap: 2 },
  title: { ...type.heading, color: colors.ink },
  meta: { ...type.small, color: colors.inkMuted },
  shared: { ...type.small, color: colors.accent },
  jones: { overflow: 'hidden' },
});
