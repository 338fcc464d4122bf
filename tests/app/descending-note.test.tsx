// The note over the Readout when a drawing is descending names the trivial link it must be: a
// descending diagram is the unlink of its components (common practice: it lifts to curves at
// stacked heights, each a plane curve), so one component is the unknot.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { DescendingNote } from '@/components/slate/DescendingNote';

test('one component: the note says unknot, not unlink', () => {
  render(<DescendingNote components={1} alternating={false} onAlternate={() => {}} />);
  expect(screen.getByText(/so this is the unknot whatever it looks like/)).toBeOnTheScreen();
  expect(screen.queryByText(/unlink/)).toBeNull();
});

test('three components: the note names the 3-component unlink, and Alternate is offered', () => {
  const onAlternate = jest.fn();
  render(<DescendingNote components={3} alternating={false} onAlternate={onAlternate} />);
  expect(screen.getByText(/so this is the 3-component unlink whatever it looks like/)).toBeOnTheScreen();
  fireEvent.press(screen.getByRole('button', { name: 'Make alternating' }));
  expect(onAlternate).toHaveBeenCalledTimes(1);
});

test('a drawing that already alternates (a curl) gets no Alternate button, and is told to draw more crossings', () => {
  // Its crossings are nugatory (tests/shared/drawing-close.test.ts checks the drawings), so
  // neither Alternate nor a flip changes the unknot.
  render(<DescendingNote components={1} alternating onAlternate={() => {}} />);
  expect(screen.getByText(/It already alternates, so each crossing untwists away: no flip changes that\. Draw more crossings\./)).toBeOnTheScreen();
  expect(screen.queryByRole('button', { name: 'Make alternating' })).toBeNull();
  expect(screen.queryByText(/make it alternating/)).toBeNull();
});
