// The note over the Readout when a drawing is descending names the trivial link it must be: a
// descending diagram is the unlink of its components (common practice: it lifts to curves at
// stacked heights, each a plane curve), so one component is the unknot.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { DescendingNote } from '@/components/slate/DescendingNote';

test('one component: the note says unknot, not unlink', () => {
  render(<DescendingNote components={1} onAlternate={() => {}} />);
  expect(screen.getByText(/so this is the unknot whatever it looks like/)).toBeOnTheScreen();
  expect(screen.queryByText(/unlink/)).toBeNull();
});

test('three components: the note names the 3-component unlink, and Alternate is offered', () => {
  const onAlternate = jest.fn();
  render(<DescendingNote components={3} onAlternate={onAlternate} />);
  expect(screen.getByText(/so this is the 3-component unlink whatever it looks like/)).toBeOnTheScreen();
  fireEvent.press(screen.getByRole('button', { name: 'Make alternating' }));
  expect(onAlternate).toHaveBeenCalledTimes(1);
});
