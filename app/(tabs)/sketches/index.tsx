// The sketchbook. Later: the list of my sketches (wide: a SplitPane with the Slate beside it;
// the Slate itself is app/(tabs)/sketches/[id].tsx).
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { EmptyState } from '@/components/ui/EmptyState';
import { SlateArt } from '@/components/shell/SlateArt';

export default function SketchesScreen() {
  return (
    <Screen>
      <PageTitle kicker="Sketchbook" title="Sketches" />
      <EmptyState art={<SlateArt />} title="Your sketchbook is empty">
        Start a new sketch and draw the strands with a finger; crossings appear where they meet and the
        invariants update as you draw. Sketches are kept on this device and work without a network.
      </EmptyState>
    </Screen>
  );
}
