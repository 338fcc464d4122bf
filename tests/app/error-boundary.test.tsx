// The root error boundary (exported by app/_layout.tsx for Expo Router): says what happened and retries.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { ErrorBoundary } from '@/app/_layout';

test('shows the error and retries on request', async () => {
  const retry = jest.fn(async () => {});
  render(<ErrorBoundary error={new Error('Cannot read the readout')} retry={retry} />);
  expect(screen.getByText('This page hit a problem')).toBeOnTheScreen();
  expect(screen.getByText('Cannot read the readout')).toBeOnTheScreen();
  fireEvent.press(screen.getByRole('button', { name: 'Try again' }));
  expect(retry).toHaveBeenCalledTimes(1);
});
