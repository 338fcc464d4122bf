// Runs: my heavy computations on the group server (polled while any is running), and a form
// to start one from a pasted PD code or braid word, or from a sketch (?sketchId=&pd=, the Slate's
// "Start run").
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
import { useMyRuns } from '@/hooks/queries/useRuns';
import { colors } from '@/constants/theme';

export default function RunsScreen() {
  const { pd, sketchId } = useLocalSearchParams<{ pd?: string; sketchId?: string }>();
  const runs = useMyRuns();
  const wide = useIsWide();
  return (
    <Screen wide>
      <PageTitle kicker="Server" title="Runs" />
      {runs.isError ? <Banner tone="error">{runs.error.message}</Banner> : null}
      {runs.data && runs.data.length === 0 ? (
        <EmptyState art={<RunsIcon color={colors.inkFaint} size={40} />} title="No runs yet">
          Start a run below, or from a sketch: Khovanov homology over the integers, Q or F_p, or a cable sweep over
          strand counts. The group's server computes it; progress shows here and an e-mail says when it is done.
        </EmptyState>
      ) : null}
      {runs.data && runs.data.length > 0 ? <RunsTable runs={runs.data} wide={wide} /> : null}
      <Section title="Start a run" note="Paste a PD code or a braid word; the server computes it and mails you when it is done.">
        <StartRunForm key={sketchId ?? ''} initialPD={pd} sketchId={sketchId} />
      </Section>
    </Screen>
  );
}
