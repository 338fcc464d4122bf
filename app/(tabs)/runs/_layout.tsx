// Runs: phone = a stack (the runs and the start form, then a run); wide = the runs on the left,
// the start form or the open run on the right (a run's focus view hides the list).
import { SplitPane } from '@/components/shell/SplitPane';
import { RunsPane } from '@/components/runs/RunsPane';
import { useRunFocus } from '@/components/runs/focus-store';

export default function RunsLayout() {
  const focused = useRunFocus((s) => s.focused);
  return <SplitPane list={<RunsPane />} listHidden={focused} />;
}
