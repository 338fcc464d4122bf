// Heavy computations. Later: the list of runs with progress, and a result page per run.
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { EmptyState } from '@/components/ui/EmptyState';
import { RunsIcon } from '@/components/shell/icons';
import { colors } from '@/constants/theme';

export default function RunsScreen() {
  return (
    <Screen>
      <PageTitle kicker="Server" title="Runs" />
      <EmptyState art={<RunsIcon color={colors.inkFaint} size={40} />} title="No runs yet">
        Open a sketch and start a run: Khovanov homology over the integers, Q or F_p, or a cable sweep over
        strand counts. The group's server computes it; progress shows here and an e-mail says when it is done.
      </EmptyState>
    </Screen>
  );
}
