// Sketches: phone = a stack (the list, then a sketch's Slate); wide = the list on the left and
// the Slate with its Readout beside it.
import { SplitPane } from '@/components/shell/SplitPane';
import { SketchList } from '@/components/slate/SketchList';

export default function SketchesLayout() {
  return <SplitPane list={<SketchList />} />;
}
