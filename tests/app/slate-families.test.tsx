// The Families builder: each family drawn with its parameters, combined with the sketch on the
// Slate (connected sum, disjoint union), mirrored, and cables following a chosen framing.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { FamiliesDialog } from '@/components/readout/FamiliesDialog';
import { analyse } from '@/shared/drawing/analyse';
import type { Sketch } from '@/shared/drawing/sketch';
import { fromBraid } from '@/shared/knot/braid';
import type { Diagram } from '@/shared/knot/diagram';
import { unknot } from '@/shared/knot/diagram';
import { jones } from '@/shared/knot/jones';
import { linkingMatrix } from '@/shared/knot/linking';

const field = (label: string) => screen.getAllByLabelText(label).find((e) => e.props.onChangeText)!;
const press = (name: string, role: 'button' | 'radio' = 'radio') => fireEvent.press(screen.getByRole(role, { name }));

function setup(current: Diagram | null) {
  const onDraw = jest.fn();
  render(<FamiliesDialog visible onClose={() => undefined} current={current} onDraw={onDraw} />);
  return onDraw;
}

// docs/conventions.md: the closure of [1,1,1] is the positive trefoil, V = t + t^3 - t^4.
const trefoil = fromBraid([1, 1, 1]);
const V = (d: Diagram) => jones(d).format('t', 'plain');

test('a twist knot with 2 half-twists is the figure-eight knot', () => {
  const onDraw = setup(null);
  press('Twist knot');
  fireEvent.changeText(field('n (half-twists)'), '2');
  press('Draw it', 'button');
  // Figure-eight: V = t^-2 - t^-1 + 1 - t + t^2 (Jones 1985; from memory).
  expect(V(onDraw.mock.calls[0][0])).toBe('t^-2 - t^-1 + 1 - t + t^2');
});

test('connected sum multiplies Jones polynomials; the mirror inverts t', () => {
  const onDraw = setup(trefoil);
  press('Connected sum');
  press('Mirror image');
  press('Draw it', 'button');
  const sum: Diagram = onDraw.mock.calls[0][0];
  // V(K1 # K2) = V(K1) V(K2) and V(mirror K)(t) = V(K)(1/t) (Jones 1985): the square knot here.
  const torus = jones(fromBraid([1, 1, 1]));
  expect(jones(sum).equals(torus.mul(torus.substitute(-1)))).toBe(true);
  expect(sum.pd).toHaveLength(6);
});

test('the (2,0)-cable of an unknot framed 1 is a two-component link with linking number 1', () => {
  const onDraw = setup(unknot);
  press('Cable of the sketch');
  expect(screen.getAllByText('integer ≥ 0')).toHaveLength(2); // r+ and r-, in the maths' sign, not ">="
  fireEvent.changeText(field('Framing'), '1');
  press('Draw it', 'button');
  // Parallel copies along a framing n link n times (common practice; Gompf and Stipsicz ch. 5).
  const m = linkingMatrix(onDraw.mock.calls[0][0]);
  expect(m).toHaveLength(2);
  expect(m[0][1]).toBe(1);
});

test('bad parameters and a missing sketch are explained', () => {
  const onDraw = setup(null);
  fireEvent.changeText(field('q (turns)'), 'three');
  press('Draw it', 'button');
  expect(screen.getByText('Expected an integer for q, got "three".')).toBeOnTheScreen();
  fireEvent.changeText(field('q (turns)'), '3');
  press('Disjoint union');
  press('Draw it', 'button');
  expect(screen.getByText('There is no sketch on the Slate to combine with; choose "Replace".')).toBeOnTheScreen();
  press('Cable of the sketch');
  press('Draw it', 'button');
  expect(screen.getByText(/Draw or paste a link first/)).toBeOnTheScreen();
  expect(onDraw).not.toHaveBeenCalled();
});

test('a torus link comes with its braid word (for the closed-braid picture), inverted when mirrored', () => {
  const onDraw = setup(null);
  fireEvent.changeText(field('p (strands)'), '3');
  fireEvent.changeText(field('q (turns)'), '4');
  press('Draw it', 'button');
  // T(3,4) is the closure of (sigma1 sigma2)^4 (shared/knot/families/torus.ts, common practice).
  const [d, braid] = onDraw.mock.calls[0];
  expect(braid).toEqual([1, 2, 1, 2, 1, 2, 1, 2]);
  expect(jones(fromBraid(braid)).toString()).toBe(jones(d).toString());
  press('Mirror image');
  press('Draw it', 'button');
  const [m, inverse] = onDraw.mock.calls[1];
  expect(inverse).toEqual([-1, -2, -1, -2, -1, -2, -1, -2]);
  expect(jones(fromBraid(inverse)).toString()).toBe(jones(m).toString());
});

// The standard pictures (shared/layout) come with the diagram; each reads back as it.
const readBack = (sketch: Sketch) => analyse(sketch).diagram!.diagram;

test('a pretzel, a connected sum and a parallel cable come with their standard pictures; reversed copies fall back to the general layout', () => {
  const onDraw = setup(trefoil);
  press('Pretzel link');
  press('Draw it', 'button');
  const [pretzel, , columns] = onDraw.mock.calls[0];
  expect(columns).toBeTruthy();
  expect(V(readBack(columns))).toBe(V(pretzel));
  press('Torus link');
  press('Connected sum');
  press('Draw it', 'button');
  const [sum, , sideBySide] = onDraw.mock.calls[1];
  expect(sideBySide).toBeTruthy();
  expect(V(readBack(sideBySide))).toBe(V(sum));
  press('Cable of the sketch');
  fireEvent.changeText(field('Framing'), '0');
  press('Draw it', 'button');
  const [cabled, , copies] = onDraw.mock.calls[2];
  expect(copies).toBeTruthy();
  expect(V(readBack(copies))).toBe(V(cabled));
  fireEvent.changeText(field('r- (reversed copies)'), '1');
  press('Draw it', 'button');
  expect(onDraw.mock.calls[3][2]).toBeFalsy();
});
