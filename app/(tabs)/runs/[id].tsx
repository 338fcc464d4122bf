// One run: progress while it computes (polled), then its result. Linked from the finished-run e-mail.
// Wide: a focus view hides the list pane and gives the page the whole width (big tables).
import { useEffect } from 'react';
import { router, useLocalSearchParams } from 'expo-router';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/ui/Button';
import { useRunFocus } from '@/components/runs/focus-store';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Banner } from '@/components/ui/Banner';
import { useIsWide } from '@/components/shell/useIsWide';
import { RunResult } from '@/components/runs/RunResult';
import { useRun } from '@/hooks/queries/useRuns';
import { labelRepeatsInput } from '@/lib/run-format';
import type { RunSummary } from '@/shared/api/runs';
import { colors, type } from '@/constants/theme';

/** A sketch's run is titled by the sketch; a pasted code is a code, shown in its own face below. */
const titleOf = (r: RunSummary) => (r.sketchId ? r.label : r.kind === 'cable-sweep' ? 'Cable sweep' : r.kind === 'bands' ? 'Unlink check' : 'Khovanov homology');

export default function RunPage() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const run = useRun(String(id));
  // Wide: the runs stay in the list pane on the left, so there is nothing to go back to.
  const wide = useIsWide();
  const back = () => (router.canGoBack() ? router.back() : router.replace('/runs'));
  const { focused, setFocused } = useRunFocus();
  // Leaving the run (or the wide layout) brings the list pane back.
  useEffect(() => () => setFocused(false), [setFocused]);
  const focus = wide && focused;
  return (
    <Screen wide={focus ? 'full' : true}>
      <PageTitle kicker="Run" title={run.data ? titleOf(run.data) : 'Run'} onBack={wide && !focus ? undefined : back} backLabel="Runs" />
      {wide && run.data?.result ? (
        <View style={styles.row}>
          <Button variant="secondary" label={focus ? 'Show the runs list' : 'Focus: use the whole width'} onPress={() => setFocused(!focus)} />
        </View>
      ) : null}
      {/* A typed code's run is named by its own label, unless that only repeats the input shown below. */}
      {run.data && !run.data.sketchId && !labelRepeatsInput(run.data) ? <Text style={styles.code} selectable>{run.data.label}</Text> : null}
      {run.isError ? <Banner tone="error">{run.error.message}</Banner> : null}
      {run.isPending ? <ActivityIndicator color={colors.accent} /> : null}
      {run.data ? <RunResult run={run.data} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
  code: { ...type.code, color: colors.inkMuted },
});
