// The Readout with its scheduling hook: values appear stage by stage, each marked while it is
// recomputed; nothing is computed while a drag is in progress; a drawing with a degeneracy
// shows its messages instead of values.
import { act, render, screen } from '@testing-library/react-native';
import { fromBraid } from '@/shared/knot/braid';
import type { Diagram } from '@/shared/knot/diagram';
import type { Marker } from '@/shared/drawing/crossings';
import { useReadout } from '@/hooks/useReadout';
import { Readout } from '@/components/readout/Readout';

function Harness({ diagram, paused = false, markers = [] }: { diagram: Diagram | null; paused?: boolean; markers?: Marker[] }) {
  const state = useReadout(diagram, paused);
  return <Readout state={state} empty={diagram ? null : markers.length ? 'markers' : 'nothing'} markers={markers} openStrands={0} />;
}

beforeEach(() => jest.useFakeTimers());
afterEach(() => jest.useRealTimers());

const run = () => act(() => void jest.runAllTimers());

// docs/conventions.md: the closure of [1,1,1] is the positive trefoil.
const trefoil = fromBraid([1, 1, 1]);

test('values of the positive trefoil appear once computed, marked as updating before', () => {
  render(<Harness diagram={trefoil} />);
  expect(screen.getAllByText('updating…').length).toBeGreaterThan(3);
  run();
  expect(screen.queryByText('updating…')).toBeNull();
  expect(screen.getByText('3 crossings')).toBeOnTheScreen();
  // Jones polynomial of the positive trefoil: t + t^3 - t^4 (docs/conventions.md; Jones 1985).
  expect(screen.getByText('V(t) = t + t³ − t⁴')).toBeOnTheScreen();
  // Alexander polynomial t^-1 - 1 + t, determinant 3 (Lickorish, ch. 6; from memory).
  expect(screen.getByText('Δ(t) = t⁻¹ − 1 + t')).toBeOnTheScreen();
  expect(screen.getByTestId('readout-determinant')).toHaveTextContent('3', { exact: false });
  // Signature of the positive trefoil is -2 in the convention where positive knots have
  // negative signature (Rolfsen, Knots and Links; from memory).
  expect(screen.getByTestId('readout-signature')).toHaveTextContent('−2', { exact: false });
  expect(screen.getByText('invariants match 3_1')).toBeOnTheScreen();
});

test('a new diagram marks the old values stale until recomputed; a drag postpones it', () => {
  const view = render(<Harness diagram={trefoil} />);
  run();
  // Flipping all three crossings gives the mirror, V(t) -> V(1/t) (Jones 1985).
  const mirror = fromBraid([-1, -1, -1]);
  view.rerender(<Harness diagram={mirror} paused />);
  run();
  expect(screen.getByTestId('readout-jones')).toHaveProp('aria-busy', true);
  expect(screen.getByText('V(t) = t + t³ − t⁴')).toBeOnTheScreen();
  view.rerender(<Harness diagram={mirror} />);
  run();
  expect(screen.getByTestId('readout-jones')).toHaveProp('aria-busy', false);
  expect(screen.getByText('V(t) = −t⁻⁴ + t⁻³ + t⁻¹')).toBeOnTheScreen();
  expect(screen.getByText('invariants match 3_1 (mirror)')).toBeOnTheScreen();
});

test('a Hopf link shows its linking number and no name guess', () => {
  // The closure of [1,1] on two strands: the positive Hopf link, lk = +1 (Rolfsen 5.D).
  render(<Harness diagram={fromBraid([1, 1])} />);
  run();
  expect(screen.getByText('lk(1,2) = +1')).toBeOnTheScreen();
  expect(screen.getByText('A link: no name guess')).toBeOnTheScreen();
});

test('a degenerate drawing shows the markers\' messages instead of values', () => {
  const marker: Marker = { kind: 'touch', at: { x: 0, y: 0 }, message: 'The strands touch here.', components: ['c1'] };
  render(<Harness diagram={null} markers={[marker]} />);
  expect(screen.getByText('One spot needs attention')).toBeOnTheScreen();
  expect(screen.getByText('The strands touch here.')).toBeOnTheScreen();
});
