// The Readout with its scheduling hooks: values appear stage by stage, each marked while it is
// recomputed; nothing is computed while a drag is in progress; a drawing with a degeneracy
// shows its messages instead of values; the s-invariant with its slice-genus bounds.
import { act, render, screen } from '@testing-library/react-native';
import { fromBraid } from '@/shared/knot/braid';
import type { Diagram } from '@/shared/knot/diagram';
import type { Marker } from '@/shared/drawing/crossings';
import { torusLink } from '@/shared/knot/families';
import { useReadout } from '@/hooks/useReadout';
import { useSInvariant } from '@/hooks/useSInvariant';
import { Readout } from '@/components/readout/Readout';
import { HOMFLY_DEVICE_LIMIT } from '@/lib/slate/readout';

function Harness({ diagram, paused = false, markers = [] }: { diagram: Diagram | null; paused?: boolean; markers?: Marker[] }) {
  const state = useReadout(diagram, paused);
  const s = useSInvariant(diagram, paused);
  return <Readout state={state} s={s} empty={diagram ? null : markers.length ? 'markers' : 'nothing'} markers={markers} openStrands={0} />;
}

beforeEach(() => jest.useFakeTimers());
afterEach(() => jest.useRealTimers());

const run = () => act(() => void jest.runAllTimers());
/** Also lets the s computation's promise settle. */
const runAsync = () => act(async () => void jest.runAllTimers());

// docs/conventions.md: the closure of [1,1,1] is the positive trefoil.
const trefoil = fromBraid([1, 1, 1]);

test('values of the positive trefoil appear once computed, marked as updating before', async () => {
  render(<Harness diagram={trefoil} />);
  expect(screen.getAllByText('updating…').length).toBeGreaterThan(3);
  await runAsync();
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
  // The name once, typeset (here the native stand-in 3₁), never again in ASCII.
  expect(screen.getByTestId('readout-name')).toHaveTextContent('invariants match 3₁');
  expect(screen.getByLabelText('invariants match 3₁')).toBeOnTheScreen();
  // The line under it names the entry the same way (Rolfsen's table; docs/conventions.md, Names).
  expect(screen.getByTestId('readout-chirality')).toHaveTextContent(/^Our table's 3₁ is the positive/);
  // HOMFLY-PT of the positive trefoil: 2v^2 - v^4 + v^2 z^2 (docs/conventions.md; from memory).
  expect(screen.getByText('P(v,z) = 2v² − v⁴ + v²z²')).toBeOnTheScreen();
});

test('beyond its size limit the HOMFLY-PT row says where to compute it', () => {
  render(<Harness diagram={fromBraid(new Array<number>(HOMFLY_DEVICE_LIMIT + 1).fill(1))} />);
  run();
  expect(screen.getByText(`Computed here up to ${HOMFLY_DEVICE_LIMIT} crossings; the command line computes it at any size.`)).toBeOnTheScreen();
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
  expect(screen.getByTestId('readout-name')).toHaveTextContent('invariants match 3₁ (mirror)');
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

describe('the s-invariant', () => {
  const sText = () => screen.getByTestId('readout-s');

  test('the positive trefoil has s = 2, both slice-genus bounds 1', async () => {
    render(<Harness diagram={trefoil} />);
    run();
    await runAsync();
    // docs/conventions.md (Rasmussen 2010, arXiv math/0402131): the positive trefoil has s = 2, signature -2.
    expect(sText()).toHaveTextContent('s = 2', { exact: false });
    expect(screen.getByTestId('readout-slice-bounds')).toHaveTextContent('Slice genus ≥ 1: |s|/2 = 1, |σ|/2 = 1, the same bound');
    expect(sText()).toHaveProp('aria-busy', false);
  });

  test('T(4,5): the bound from s is stronger than the signature\'s', async () => {
    render(<Harness diagram={torusLink(4, 5)} />);
    run();
    await runAsync();
    // s(T(4,5)) = (4-1)(5-1) = 12 (Rasmussen 2010); signature -8 (from memory: torus knot signatures,
    // Gordon, Litherland and Murasugi, "Signatures of iterated torus knots", 1981).
    expect(screen.getByTestId('readout-slice-bounds')).toHaveTextContent('Slice genus ≥ 6: |s|/2 = 6, |σ|/2 = 4, the bound from s is stronger');
  });

  test('the mirror trefoil is marked stale during a drag, then s = −2', async () => {
    const view = render(<Harness diagram={trefoil} />);
    await runAsync();
    view.rerender(<Harness diagram={fromBraid([-1, -1, -1])} paused />);
    await runAsync();
    expect(sText()).toHaveProp('aria-busy', true);
    expect(sText()).toHaveTextContent('s = 2', { exact: false });
    view.rerender(<Harness diagram={fromBraid([-1, -1, -1])} />);
    await runAsync();
    // s of the mirror is -s (Rasmussen 2010).
    expect(sText()).toHaveTextContent('s = −2', { exact: false });
  });

  test('a link says s is defined for knots here; a large knot is left to a run', async () => {
    const view = render(<Harness diagram={fromBraid([1, 1])} />);
    await runAsync();
    expect(sText()).toHaveTextContent('s is defined for knots here.', { exact: false });
    // T(2,21) is a knot of 21 crossings (p, q coprime; common practice).
    view.rerender(<Harness diagram={torusLink(2, 21)} />);
    await runAsync();
    expect(sText()).toHaveTextContent('Computed on the device up to 20 crossings (this has 21); a Khovanov run can also compute s.', { exact: false });
  });
});
