// The runs I can see: whose (mine or a group's), an empty state, the table. On a phone the Runs
// page puts it beside the start form; on a wide screen it is the list pane on the left.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useGlobalSearchParams } from 'expo-router';
import { EmptyState } from '@/components/ui/EmptyState';
import { TeX } from '@/components/ui/Math';
import { Banner } from '@/components/ui/Banner';
import { RunsIcon } from '@/components/shell/icons';
import { useGroups } from '@/hooks/queries/useGroups';
import { useRunList, type RunScope } from '@/hooks/queries/useRuns';
import { colors, fonts, radius, space, type } from '@/constants/theme';
import { RunsTable } from './RunsTable';

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

/**
 * `formWhere` says where the start form is ("below", "on the right"); `hideEmpty` when the form
 * leads anyway: then no runs is one line, not the invitation (a blank list pane looked broken).
 */
export function RunsOverview({ formWhere, hideEmpty = false }: { formWhere: string; hideEmpty?: boolean }) {
  const [scope, setScope] = useState<RunScope>('mine');
  const runs = useRunList(scope);
  const { id: openId } = useGlobalSearchParams<{ id?: string }>();
  return (
    <>
      <ScopePicker value={scope} onChange={setScope} />
      {runs.isError ? <Banner tone="error">{runs.error.message}</Banner> : null}
      {runs.data && runs.data.length === 0 && hideEmpty ? <Text style={styles.none}>{scope === 'mine' ? 'No runs yet.' : 'No runs in this group yet.'}</Text> : null}
      {runs.data && runs.data.length === 0 && !hideEmpty ? (
        <EmptyState art={<RunsIcon color={colors.inkFaint} size={40} />} title={scope === 'mine' ? 'No runs yet' : 'No runs in this group yet'}>
          Start a run {formWhere}, or from a sketch: Khovanov homology over the integers, <TeX tex="\mathbb{Q}" text="ℚ" /> or <TeX tex="\mathbb{F}_p" text="𝔽ₚ" />, or a cable sweep over
          strand counts. The group's server computes it; progress shows here and an e-mail says when it is done.
        </EmptyState>
      ) : null}
      {runs.data && runs.data.length > 0 ? <RunsTable runs={runs.data} openId={openId} /> : null}
    </>
  );
}

const styles = StyleSheet.create({
  scopes: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  scope: { maxWidth: '100%', paddingHorizontal: space.md, paddingVertical: space.sm, borderRadius: radius.pill, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  chosen: { backgroundColor: colors.ink, borderColor: colors.ink },
  scopeText: { ...type.small, color: colors.ink, flexShrink: 1 },
  chosenText: { color: colors.onAccent, fontFamily: fonts.medium },
  none: { ...type.small, color: colors.inkMuted },
});
