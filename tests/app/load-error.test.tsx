// LoadError: a 404 in the page's own words, any other failure with the error's message.
import { render, screen } from '@testing-library/react-native';
import { LoadError } from '@/components/ui/LoadError';
import { ApiError } from '@/lib/api';

const props = { failed: 'Could not load the group', notFound: { title: 'Group not found', text: 'Not one of your groups.' } };

test('a 404 says the page is not there, in its own words', () => {
  render(<LoadError {...props} error={new ApiError(404, 'not_found', 'No such group')} />);
  expect(screen.getByText('Group not found')).toBeOnTheScreen();
  expect(screen.getByText('Not one of your groups.')).toBeOnTheScreen();
  expect(screen.queryByText('No such group')).toBeNull();
});

test('any other failure shows its own message under the general title', () => {
  render(<LoadError {...props} error={new ApiError(0, 'network', 'The server could not be reached.')} />);
  expect(screen.getByText('Could not load the group')).toBeOnTheScreen();
  expect(screen.getByText('The server could not be reached.')).toBeOnTheScreen();
  expect(screen.queryByText('Group not found')).toBeNull();
});
