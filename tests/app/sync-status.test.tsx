// The Sketches header's sync row keeps its "Sync now" button while a round runs (disabled), so
// the row keeps its width and the list under it does not jump each time a sync starts and ends.
import { fireEvent, render, screen } from '@testing-library/react-native';
import type { SyncStatus as Status } from '@/sync/status';
import { SyncStatus } from '@/components/sync/SyncStatus';

const mockSyncNow = jest.fn();
let mockStatus: Status = { kind: 'upToDate' };
jest.mock('@/hooks/useDevice', () => ({ useSyncStatus: () => ({ status: mockStatus, label: mockStatus.kind, syncNow: mockSyncNow }) }));
jest.mock('expo-router', () => ({ router: { push: jest.fn() } }));

test('syncing: "Sync now" is still there, disabled, and a press starts nothing', () => {
  mockStatus = { kind: 'syncing', waiting: 1 };
  render(<SyncStatus />);
  const button = screen.getByRole('button', { name: 'Sync now' });
  expect(button).toBeDisabled();
  fireEvent.press(button);
  expect(mockSyncNow).not.toHaveBeenCalled();
});

test('up to date: the same button is enabled and starts a round', () => {
  mockStatus = { kind: 'upToDate' };
  render(<SyncStatus />);
  const button = screen.getByRole('button', { name: 'Sync now' });
  expect(button).toBeEnabled();
  fireEvent.press(button);
  expect(mockSyncNow).toHaveBeenCalledTimes(1);
});
