// One run: progress while it computes (polled), then its result. Linked from the finished-run e-mail.
import { router, useLocalSearchParams } from 'expo-router';
import { ActivityIndicator } from 'react-native';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Banner } from '@/components/ui/Banner';
import { RunResult } from '@/components/runs/RunResult';
import { useRun } from '@/hooks/queries/useRuns';
import { colors } from '@/constants/theme';

export default function RunPage() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const run = useRun(String(id));
  const back = () => (router.canGoBack() ? router.back() : router.replace('/runs' as never));
  return (
    <Screen wide>
      <PageTitle kicker="Run" title={run.data?.label ?? 'Run'} onBack={back} backLabel="Runs" />
      {run.isError ? <Banner tone="error">{run.error.message}</Banner> : null}
      {run.isPending ? <ActivityIndicator color={colors.accent} /> : null}
      {run.data ? <RunResult run={run.data} /> : null}
    </Screen>
  );
}
