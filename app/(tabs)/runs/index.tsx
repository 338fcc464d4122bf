// Runs: my heavy computations on the group server (polled while any is running), and a form
// to start one from a pasted PD code or braid word, or from a sketch (?sketchId=&pd=, the Slate's
// "Start run").
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { EmptyState } from '@/components/ui/EmptyState';
import { Banner } from '@/components/ui/Banner';
import { Section } from '@/components/ui/Section';
import { RunsIcon } from '@/components/shell/icons';
import { useIsWide } from '@/components/shell/useIsWide';
import { RunsTable } from '@/components/runs/RunsTable';
import { StartRunForm } from '@/components/runs/StartRunForm';
import { useGroups } from '@/hooks/queries/useGroups';
import { useRunList, type RunScope } from '@/hooks/queries/useRuns';
import { colors, fonts, radius, space, type } from '@/constants/theme';

/** Whose runs: mine, or one of my groups'. */
function ScopePicker({ value, onChange }: { value: RunScope; onChange: (s: RunScope) => void }) {
  const groups = useGroups();
  const options: { label: string; scope: RunScope }[] = [{ label: 'Mine', scope: 'mine' }, ...(groups.data ?? []).map((g) => ({ label: g.name, scope: { groupId: g.id } }))];
  if (options.length === 1) return null;
  const same = (a: RunScope, b: RunScope) => (a === 'mine' ? b === 'mine' : b !== 'mine' && a.groupId === b.groupId);
  return (
    <View role="radiogroup" aria-label="Whose runs" style={styles.scopes}>
      {options.map((o) => (
        <Pressable key={o.label} role="radio" aria-checked={same(o.scope, value)} onPress={() => onChange(o.scope)} style={[styles.scope, same(o.scope, value) && styles.chosen]}>
          <Text style={[styles.scopeText, same(o.scope, value) && styles.chosenText]} numberOfLines={1}>{o.label}</Text>
        </Pressable>
      ))}
    </View>
  );
}

export default function RunsScreen() {
  const { pd, sketchId } = useLocalSearchParams<{ pd?: string; sketchId?: string }>();
  const [scope, setScope] = useState<RunScope>('mine');
  const runs = useRunList(scope);
  const wide = useIsWide();
  // Arriving from a sketch ("Start a run" on the Slate or the feed), the form comes first.
  const fromSketch = !!sketchId;
  const form = fromSketch ? (
    <Section title="Start a run on this sketch" note="The server computes it and mails you when it is done.">
      <StartRunForm key={sketchId} initialPD={pd} sketchId={sketchId} />
    </Section>
  ) : (
    <Section title="Start a run" note="Paste a PD code or a braid word; the server computes it and mails you when it is done.">
      <StartRunForm key="" initialPD={pd} />
    </Section>
  );
  return (
    <Screen wide>
      <PageTitle kicker="Server" title="Runs" />
      {fromSketch ? form : null}
      <ScopePicker value={scope} onChange={setScope} />
      {runs.isError ? <Banner tone="error">{runs.error.message}</Banner> : null}
      {runs.data && runs.data.length === 0 && !fromSketch ? (
        <EmptyState art={<RunsIcon color={colors.inkFaint} size={40} />} title={scope === 'mine' ? 'No runs yet' : 'No runs in this group yet'}>
          Start a run below, or from a sketch: Khovanov homology over the integers, Q or F_p, or a cable sweep over
          strand counts. The group's server computes it; progress shows here and an e-mail says when it is done.
        </EmptyState>
      ) : null}
      {runs.data && runs.data.length > 0 ? <RunsTable runs={runs.data} wide={wide} /> : null}
      {fromSketch ? null : form}
    </Screen>
  );
}

const styles = StyleSheet.create({
  scopes: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  scope: { maxWidth: '100%', paddingHorizontal: space.md, paddingVertical: space.sm, borderRadius: radius.pill, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  chosen: { backgroundColor: colors.ink, borderColor: colors.ink },
  scopeText: { ...type.small, color: colors.ink, flexShrink: 1 },
  chosenText: { color: colors.onAccent, fontFamily: fonts.medium },
});
