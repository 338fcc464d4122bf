// Runs: phone = a stack (the runs and the start form, then a run); wide = the runs on the left,
// the start form or the open run on the right.
import { SplitPane } from '@/components/shell/SplitPane';
import { RunsPane } from '@/components/runs/RunsPane';

export default function RunsLayout() {
  return <SplitPane list={<RunsPane />} />;
}
