// Runs: my heavy computations on the group server (polled while any is running), and a form
// to start one from a pasted PD code or braid word, or from a sketch (?sketchId=&pd=, the Slate's
// "Start run"). Phone: the runs and the form on one page. Wide: the runs are already in the list
// pane on the left, so this is the form alone.
import { useLocalSearchParams } from 'expo-router';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Section } from '@/components/ui/Section';
import { useIsWide } from '@/components/shell/useIsWide';
import { RunsOverview } from '@/components/runs/RunsOverview';
import { StartRunForm } from '@/components/runs/StartRunForm';

export default function RunsScreen() {
  const { pd, sketchId } = useLocalSearchParams<{ pd?: string; sketchId?: string }>();
  const wide = useIsWide();
  // Arriving from a sketch ("Start a run" on the Slate or the feed), the form comes first.
  const fromSketch = !!sketchId;
  const form = fromSketch ? (
    <Section key="form" title="Start a run on this sketch" note="The server computes it and mails you when it is done.">
      <StartRunForm key={sketchId} initialPD={pd} sketchId={sketchId} />
    </Section>
  ) : (
    <Section key="form" title="Start a run" note="Paste a PD code, DT code or braid word; the server computes it and mails you when it is done.">
      <StartRunForm key="" initialPD={pd} />
    </Section>
  );
  // One tree for both layouts, the form keyed, so resizing keeps what is typed into it.
  return (
    <Screen wide={!wide}>
      {wide ? <PageTitle kicker="Runs" title="New run" /> : <PageTitle kicker="Server" title="Runs" />}
      {fromSketch || wide ? form : null}
      {wide ? null : <RunsOverview formWhere="below" hideEmpty={fromSketch} />}
      {fromSketch || wide ? null : form}
    </Screen>
  );
}
