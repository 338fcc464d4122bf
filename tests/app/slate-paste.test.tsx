// The paste-a-code dialog: bad codes are refused with the reason; good ones are drawn.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { PasteCodeDialog } from '@/components/readout/PasteCodeDialog';
import { jones } from '@/shared/knot/jones';

function setup() {
  const onDraw = jest.fn();
  render(<PasteCodeDialog visible onClose={() => undefined} onDraw={onDraw} />);
  return { onDraw };
}

const field = (label: string) => screen.getAllByLabelText(label).find((e) => e.props.onChangeText)!;

test('a PD code with a wrong crossing is refused with the reason, and nothing is drawn', () => {
  const { onDraw } = setup();
  fireEvent.changeText(field('PD code'), '[[1,2,3]]');
  fireEvent.press(screen.getByRole('button', { name: 'Draw it' }));
  expect(screen.getByRole('alert')).toHaveTextContent('Crossing 1 must have exactly 4 labels, got [1,2,3].');
  expect(onDraw).not.toHaveBeenCalled();
});

test('X[...] PD codes, braid words and DT codes are drawn', () => {
  const { onDraw } = setup();
  // The positive trefoil in docs/conventions.md (from memory): Jones t + t^3 - t^4.
  fireEvent.changeText(field('PD code'), 'X[1,5,2,4] X[3,1,4,6] X[5,3,6,2]');
  fireEvent.press(screen.getByRole('button', { name: 'Draw it' }));
  expect(onDraw).toHaveBeenCalledTimes(1);
  expect(onDraw.mock.calls[0][0].pd).toHaveLength(3);
  expect(jones(onDraw.mock.calls[0][0]).format('t', 'plain')).toBe('t + t^3 - t^4');

  fireEvent.press(screen.getByRole('radio', { name: 'Braid word' }));
  fireEvent.changeText(field('Braid word'), '1 -2 1 -2');
  fireEvent.press(screen.getByRole('button', { name: 'Draw it' }));
  // sigma1 sigma2^-1 sigma1 sigma2^-1 closes to the figure-eight knot (from memory): 4 crossings.
  const [figureEight, word] = onDraw.mock.calls[1];
  expect(figureEight.pd).toHaveLength(4);
  expect(word).toEqual([1, -2, 1, -2]);
  expect(jones(figureEight).format('t', 'plain')).toBe('t^-2 - t^-1 + 1 - t + t^2');

  fireEvent.press(screen.getByRole('radio', { name: 'DT code' }));
  fireEvent.changeText(field('DT code'), '4 6 x');
  fireEvent.press(screen.getByRole('button', { name: 'Draw it' }));
  expect(screen.getByRole('alert')).toHaveTextContent('DT entry "x" is not an integer.');
  expect(onDraw).toHaveBeenCalledTimes(2);
});
