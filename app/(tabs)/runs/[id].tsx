// One run: progress while it computes (polled), then its result. Linked from the finished-run e-mail.
import { router, useLocalSearchParams } from 'expo-router';
import { ActivityIndicator, StyleSheet, Text } from 'react-native';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Banner } from '@/components/ui/Banner';
import { useIsWide } from '@/components/shell/useIsWide';
import { RunResult } from '@/components/runs/RunResult';
import { useRun } from '@/hooks/queries/useRuns';
import type { RunSummary } from '@/shared/api/runs';
import { colors, type } from '@/constants/theme';

/** A sketch's run is titled by the sketch; a pasted code is a code, shown in its own face below. */
const titleOf = (r: RunSummary) => (r.sketchId ? r.label : r.kind === 'cable-sweep' ? 'Cable sweep' : 'Khovanov homology');

export default function RunPage() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const run = useRun(String(id));
  // Wide: the runs stay in the list pane on the left, so there is nothing to go back to.
  const wide = useIsWide();
  const back = () => (router.canGoBack() ? router.back() : router.replace('/runs'));
  return (
    <Screen wide>
      <PageTitle kicker="Run" title={run.data ? titleOf(run.data) : 'Run'} onBack={wide ? undefined : back} backLabel="Runs" />
      {run.data && !run.data.sketchId ? <Text style={styles.code} selectable>{run.data.label}</Text> : null}
      {run.isError ? <Banner tone="error">{run.error.message}</Banner> : null}
      {run.isPending ? <ActivityIndicator color={colors.accent} /> : null}
      {run.data ? <RunResult run={run.data} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  code: { ...type.code, color: colors.inkMuted },
});
